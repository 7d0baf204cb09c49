// Compressed delivery: the web app's precompressed .br / .gz copies (server/http/precompressed.ts) and on-the-fly
// compression of larger answers (server/http/compress-api.ts), read as raw bytes so the encoding itself is checked.
import fs from 'node:fs';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import os from 'node:os';
import path from 'node:path';
import zlib from 'node:zlib';
import express from 'express';
import { compressAnswers } from '../../../server/http/compress-api';
import { signInAs } from '../helpers/sign-in';
import { setupTestApp, type TestContext } from '../helpers/test-app';

type RawAnswer = { status: number; headers: http.IncomingHttpHeaders; body: Buffer };

/** One request to `app` on an ephemeral port; the body is returned exactly as sent (no decoding). */
async function rawRequest(app: express.Application, urlPath: string, headers: Record<string, string> = {}, method = 'GET', body?: string): Promise<RawAnswer> {
  const server = app.listen(0, '127.0.0.1');
  await new Promise<void>((resolve) => server.once('listening', () => resolve()));
  const { port } = server.address() as AddressInfo;
  try {
    return await new Promise<RawAnswer>((resolve, reject) => {
      const req = http.request({ host: '127.0.0.1', port, path: urlPath, method, headers }, (res) => {
        const chunks: Buffer[] = [];
        res.on('data', (chunk: Buffer) => chunks.push(chunk));
        res.on('end', () => resolve({ status: res.statusCode ?? 0, headers: res.headers, body: Buffer.concat(chunks) }));
        res.on('error', reject);
      });
      req.on('error', reject);
      req.end(body);
    });
  } finally {
    await new Promise<void>((resolve) => server.close(() => resolve()));
  }
}

function decode(answer: RawAnswer): Buffer {
  switch (answer.headers['content-encoding']) {
    case 'br':
      return zlib.brotliDecompressSync(answer.body);
    case 'gzip':
      return zlib.gunzipSync(answer.body);
    default:
      return answer.body;
  }
}

let ctx: TestContext;
let webDist: string;
const BUNDLE = '/_expo/static/js/web/entry-0123abcd.js';
const ROUTE_CHUNK = '/_expo/static/js/web/[windowId]-4567cdef.js';
const FONT = '/assets/node_modules/@expo-google-fonts/work-sans/400Regular/WorkSans_400Regular.25a94460959b4950ae6ed4086fd21d69.ttf';
// Varied text so the compressed copies differ in size from each other and from the original.
const bundleText = Array.from({ length: 4000 }, (_, i) => `var slice${i} = { sst: ${i % 4}, name: "slice ${i * 7919}" };`).join('\n');

beforeAll(async () => {
  ctx = await setupTestApp();
  webDist = fs.mkdtempSync(path.join(os.tmpdir(), 'slackwater-web-'));
  fs.writeFileSync(path.join(webDist, 'index.html'), '<!doctype html><title>Slackwater test shell</title>');
  const bundle = path.join(webDist, BUNDLE);
  fs.mkdirSync(path.dirname(bundle), { recursive: true });
  fs.writeFileSync(bundle, bundleText);
  // Marked copies: the answer's bytes show which file was sent.
  fs.writeFileSync(`${bundle}.br`, zlib.brotliCompressSync(`${bundleText}\n// br copy`));
  fs.writeFileSync(`${bundle}.gz`, zlib.gzipSync(`${bundleText}\n// gz copy`));
  fs.writeFileSync(path.join(webDist, 'plain.js'), bundleText);
  // A route's chunk (a dynamic segment keeps its brackets in the name) and a font Metro copied under its content hash.
  const chunk = path.join(webDist, ROUTE_CHUNK);
  fs.writeFileSync(chunk, bundleText);
  fs.writeFileSync(`${chunk}.br`, zlib.brotliCompressSync(`${bundleText}\n// chunk br copy`));
  fs.mkdirSync(path.join(webDist, path.dirname(FONT)), { recursive: true });
  fs.writeFileSync(path.join(webDist, FONT), 'font bytes');
  fs.writeFileSync(path.join(webDist, 'assets', 'unhashed.png'), 'image bytes');
});
afterAll(async () => {
  fs.rmSync(webDist, { recursive: true, force: true });
  await ctx.close();
});

const webApp = () => ctx.makeApp({ config: { ...ctx.config, webDist } });

describe('precompressed web assets', () => {
  test('a client that accepts br gets the brotli copy, with the bundle type, Vary and the long cache lifetime', async () => {
    const res = await rawRequest(webApp(), BUNDLE, { 'Accept-Encoding': 'gzip, deflate, br' });
    expect(res.status).toBe(200);
    expect(res.headers['content-encoding']).toBe('br');
    // The same type as the file itself, never one for a .br file.
    const identity = await rawRequest(webApp(), BUNDLE);
    expect(identity.headers['content-type']).toMatch(/javascript/);
    expect(res.headers['content-type']).toBe(identity.headers['content-type']);
    expect(res.headers.vary).toMatch(/Accept-Encoding/i);
    expect(res.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    expect(Number(res.headers['content-length'])).toBe(fs.statSync(path.join(webDist, `${BUNDLE}.br`)).size);
    expect(decode(res).toString()).toBe(`${bundleText}\n// br copy`);
  });

  test('a client that accepts only gzip (or refuses br) gets the gzip copy', async () => {
    for (const acceptEncoding of ['gzip', 'br;q=0, gzip', 'identity, gzip;q=0.5']) {
      const res = await rawRequest(webApp(), BUNDLE, { 'Accept-Encoding': acceptEncoding });
      expect(res.headers['content-encoding']).toBe('gzip');
      expect(res.headers.vary).toMatch(/Accept-Encoding/i);
      expect(decode(res).toString()).toBe(`${bundleText}\n// gz copy`);
    }
  });

  test('a client that accepts no compression gets the file itself, still with Vary', async () => {
    for (const headers of [{} as Record<string, string>, { 'Accept-Encoding': 'identity' }, { 'Accept-Encoding': 'br;q=0, gzip;q=0' }]) {
      const res = await rawRequest(webApp(), BUNDLE, headers);
      expect(res.status).toBe(200);
      expect(res.headers['content-encoding']).toBeUndefined();
      expect(res.headers.vary).toMatch(/Accept-Encoding/i);
      expect(res.body.toString()).toBe(bundleText);
    }
  });

  test('a range is served from the file itself, never from a compressed copy', async () => {
    const res = await rawRequest(webApp(), BUNDLE, { 'Accept-Encoding': 'br, gzip', Range: 'bytes=0-99' });
    expect(res.status).toBe(206);
    expect(res.headers['content-encoding']).toBeUndefined();
    expect(res.body.toString()).toBe(bundleText.slice(0, 100));
  });

  test('HEAD names the brotli copy without a body', async () => {
    const res = await rawRequest(webApp(), BUNDLE, { 'Accept-Encoding': 'br' }, 'HEAD');
    expect(res.status).toBe(200);
    expect(res.headers['content-encoding']).toBe('br');
    expect(res.body.length).toBe(0);
  });

  test('a route chunk, asked for as a browser writes its brackets, gets its brotli copy and the long cache lifetime under the CSP', async () => {
    for (const urlPath of [ROUTE_CHUNK, ROUTE_CHUNK.replace('[', '%5B').replace(']', '%5D')]) {
      const res = await rawRequest(webApp(), urlPath, { 'Accept-Encoding': 'br' });
      expect(res.status).toBe(200);
      expect(res.headers['content-encoding']).toBe('br');
      expect(res.headers['cache-control']).toBe('public, max-age=31536000, immutable');
      expect(decode(res).toString()).toBe(`${bundleText}\n// chunk br copy`);
    }
    // Chunks load from the app's own origin, so script-src stays 'self' alone.
    const page = await rawRequest(webApp(), '/windows/some-window');
    const scriptSrc = /script-src ([^;]*)/.exec(String(page.headers['content-security-policy']))?.[1];
    expect(scriptSrc).toBe("'self'");
  });

  test('files Metro names after their content hash are cached for a year; other assets and index.html are not', async () => {
    expect((await rawRequest(webApp(), FONT)).headers['cache-control']).toBe('public, max-age=31536000, immutable');
    expect((await rawRequest(webApp(), '/assets/unhashed.png')).headers['cache-control']).not.toMatch(/immutable/);
    expect((await rawRequest(webApp(), '/calendar')).headers['cache-control']).toBe('no-cache');
  });

  test('a file without copies is compressed on the fly, and a path outside the web app is never served', async () => {
    const res = await rawRequest(webApp(), '/plain.js', { 'Accept-Encoding': 'gzip' });
    expect(res.headers['content-encoding']).toBe('gzip');
    expect(decode(res).toString()).toBe(bundleText);
    const outside = await rawRequest(webApp(), '/..%2f..%2fetc%2fpasswd.js', { 'Accept-Encoding': 'br' });
    expect(outside.headers['content-encoding']).toBeUndefined();
    expect(outside.body.toString()).not.toContain('root:');
  });
});

describe('compressed answers', () => {
  const miniApp = () => {
    const app = express();
    app.use(compressAnswers());
    const big = { slices: Array.from({ length: 200 }, (_, i) => ({ name: `slice ${i}`, sst: i % 4 })) };
    app.get('/big', (_req, res) => res.json(big));
    app.get('/small', (_req, res) => res.json({ ok: true }));
    app.get('/events', (_req, res) => {
      res.setHeader('Content-Type', 'text/event-stream');
      res.end(`data: ${'x'.repeat(4000)}\n\n`);
    });
    app.get('/image', (_req, res) => res.type('png').send(Buffer.alloc(4000, 1)));
    return { app, big };
  };

  test('JSON of 1 KB and more is compressed with br first, then gzip, with Vary', async () => {
    const { app, big } = miniApp();
    const br = await rawRequest(app, '/big', { 'Accept-Encoding': 'gzip, br' });
    expect(br.headers['content-encoding']).toBe('br');
    expect(br.headers.vary).toMatch(/Accept-Encoding/i);
    expect(JSON.parse(decode(br).toString())).toEqual(big);
    expect(br.body.length).toBeLessThan(JSON.stringify(big).length);
    const gzip = await rawRequest(app, '/big', { 'Accept-Encoding': 'gzip' });
    expect(gzip.headers['content-encoding']).toBe('gzip');
    expect(JSON.parse(decode(gzip).toString())).toEqual(big);
  });

  test('small answers, event streams and already-compressed types go out as they are', async () => {
    const { app } = miniApp();
    for (const urlPath of ['/small', '/events', '/image']) {
      const res = await rawRequest(app, urlPath, { 'Accept-Encoding': 'br, gzip' });
      expect([urlPath, res.headers['content-encoding']]).toEqual([urlPath, undefined]);
    }
  });

  test('a real API answer of more than 1 KB comes compressed to a client that asks', async () => {
    const cookie = await signInAs(ctx.app, ctx.users.planner.email);
    // A scenario with many faults: the answer lists every issue, well over 1 KB.
    const scenario = JSON.stringify({ slices: Array.from({ length: 60 }, () => ({ sst: 'not a number' })) });
    const res = await rawRequest(
      ctx.app,
      '/api/scenarios/validate',
      { 'Accept-Encoding': 'br', 'Content-Type': 'application/json', Cookie: cookie },
      'POST',
      scenario,
    );
    expect(res.status).toBe(200);
    expect(res.headers['content-encoding']).toBe('br');
    const answer = JSON.parse(decode(res).toString());
    expect(answer.ok).toBe(false);
    expect(JSON.stringify(answer).length).toBeGreaterThan(1024);
  });
});
