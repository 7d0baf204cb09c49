// The parts of createApp() around the routes: security headers, unknown API routes, the web app with SPA fallback.
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { setupTestApp, type TestContext } from './helpers/test-app';

let ctx: TestContext;
let webDist: string;
beforeAll(async () => {
  ctx = await setupTestApp();
  webDist = fs.mkdtempSync(path.join(os.tmpdir(), 'slackwater-web-'));
  fs.writeFileSync(path.join(webDist, 'index.html'), '<!doctype html><title>Slackwater test shell</title>');
  fs.mkdirSync(path.join(webDist, '_expo', 'static', 'js'), { recursive: true });
  fs.writeFileSync(path.join(webDist, '_expo', 'static', 'js', 'entry-abc.js'), 'console.log(1)');
});
afterAll(async () => {
  fs.rmSync(webDist, { recursive: true, force: true });
  await ctx.close();
});

const webApp = () => ctx.makeApp({ config: { ...ctx.config, webDist } });

test('helmet headers and a CSP that allows own scripts, inline styles and data: fonts', async () => {
  const res = await request(ctx.app).get('/api/health');
  const csp = res.headers['content-security-policy'];
  expect(csp).toContain("script-src 'self'");
  expect(csp).toContain("style-src 'self' 'unsafe-inline'");
  expect(csp).toContain("font-src 'self' data:");
  expect(csp).not.toContain('upgrade-insecure-requests');
  expect(res.headers['x-content-type-options']).toBe('nosniff');
  expect(res.headers['x-powered-by']).toBeUndefined();
});

test('an unknown /api route answers 404 ROUTE_NOT_FOUND as JSON, never the web app', async () => {
  const res = await request(webApp()).get('/api/no-such-thing');
  expect(res.status).toBe(404);
  expect(res.body).toEqual({ error: { code: 'ROUTE_NOT_FOUND', message: 'No API route for GET /api/no-such-thing.' } });
});

test.each(['/', '/overview', '/windows/w-1/plan'])('GET %s serves index.html (SPA fallback)', async (url) => {
  const res = await request(webApp()).get(url);
  expect(res.status).toBe(200);
  expect(res.text).toContain('Slackwater test shell');
  expect(res.headers['cache-control']).toBe('no-cache');
});

test('hashed bundles are served with a long cache lifetime', async () => {
  const res = await request(webApp()).get('/_expo/static/js/entry-abc.js');
  expect(res.status).toBe(200);
  expect(res.headers['cache-control']).toContain('immutable');
});

test('without an exported web app, pages answer a clear 404 JSON', async () => {
  const res = await request(ctx.app).get('/overview');
  expect(res.status).toBe(404);
  expect(res.body.error.code).toBe('WEB_APP_MISSING');
});
