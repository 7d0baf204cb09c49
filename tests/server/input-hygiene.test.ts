// Input hygiene: NUL and lone surrogates anywhere in a body, path or query, broken percent-encoding and bad
// bodies each answer 4xx with a code naming what is wrong, and nothing is written or logged with the values.
import { gzipSync } from 'node:zlib';
import request from 'supertest';
import { signedInRequests } from './helpers/sign-in';
import { setupTestApp, type TestContext } from './helpers/test-app';

let ctx: TestContext;
let as: ReturnType<typeof signedInRequests<'admin' | 'planner'>>;
const logged: string[] = [];
beforeAll(async () => {
  ctx = await setupTestApp();
  ctx.app = ctx.makeApp({ log: (message, err) => logged.push(`${message} ${String(err)}`) });
  as = signedInRequests(ctx.app, (who) => ctx.users[who].email);
});
afterAll(() => ctx.close());
afterEach(() => expect(logged).toEqual([]));

const windowBody = (over: Record<string, unknown> = {}) => ({
  title: 'Fibre splice', startsAt: '2031-03-01T01:00:00Z', endsAt: '2031-03-01T03:00:00Z',
  elements: [{ kind: 'site', id: 'a' }, { kind: 'site', id: 'b' }, { kind: 'site', id: 'c' }], ...over,
});

async function windowCount(): Promise<number> {
  return Number((await ctx.pool.query('select count(*) from windows')).rows[0].count);
}

test.each([
  ['a NUL in the title', windowBody({ title: 'a\u0000b' }), /^title contains a NUL character/],
  ['a lone high surrogate in the title', windowBody({ title: 'x\ud800y' }), /^title contains an unpaired UTF-16 surrogate/],
  ['a lone low surrogate at the end', windowBody({ title: 'x\udc00' }), /^title contains an unpaired UTF-16 surrogate/],
  ['a NUL in elements[2].id', windowBody({ elements: [{ kind: 'site', id: 'a' }, { kind: 'site', id: 'b' }, { kind: 'site', id: '\u0000' }] }), /^elements\[2\]\.id contains a NUL/],
  ['a NUL in a key', windowBody({ extra: { 'k\u0000': 1 } }), /^extra contains a key with a NUL/],
])('POST /api/windows with %s is refused with 400 BAD_TEXT naming the field, nothing stored', async (_what, body, message) => {
  const before = await windowCount();
  const res = await (await as('planner'))('post', '/api/windows').send(body);
  expect(res.status).toBe(400);
  expect(res.body.error).toEqual({ code: 'BAD_TEXT', message: expect.stringMatching(message) });
  expect(await windowCount()).toBe(before);
});

test('a paired surrogate (an emoji) is not refused by the text check', async () => {
  const res = await (await as('planner'))('post', '/api/windows').send(windowBody({ title: 'Splice \ud83d\ude00', elements: [] }));
  expect(res.body.error?.code).not.toBe('BAD_TEXT');
  expect(res.status).toBeLessThan(500);
});

test.each([
  ['post', '/api/freezes', { title: 'Freeze\u0000', startsAt: '2031-01-01T00:00:00Z', endsAt: '2031-01-02T00:00:00Z' }, /^title contains/],
  ['post', '/api/windows/w1/plans', { pinned: ['s1', 'x\ud800'] }, /^pinned\[1\] contains an unpaired/],
  ['post', '/api/auth/sign-in', { email: 'a\u0000@b.example', password: 'x' }, /^email contains a NUL/],
] as const)('%s %s with bad text answers 400 BAD_TEXT', async (method, path, body, message) => {
  const res = await (await as('admin'))(method, path).send(body);
  expect(res.status).toBe(400);
  expect(res.body.error).toEqual({ code: 'BAD_TEXT', message: expect.stringMatching(message) });
});

test.each([
  ['/api/windows/%00', 'BAD_TEXT', /^URL path segment 3 contains a NUL/],
  ['/api/windows/%00/impact', 'BAD_TEXT', /^URL path segment 3 contains a NUL/],
  ['/api/windows?element=%00', 'BAD_TEXT', /^query element contains a NUL/],
  ['/api/windows?from=x&element=a%00b', 'BAD_TEXT', /^query element contains a NUL/],
  ['/api/windows?k%00=1', 'BAD_TEXT', /^query string contains a key with a NUL/],
  ['/api/windows/%E0%A4%A', 'BAD_URL', /path segment 3 is not valid percent-encoding/],
  ['/api/windows/%ED%A0%80', 'BAD_URL', /path segment 3/],
  ['/api/imports/%', 'BAD_URL', /path segment 3/],
])('GET %s answers 400 %s', async (path, code, message) => {
  const res = await (await as('admin'))('get', path);
  expect(res.status).toBe(400);
  expect(res.body.error).toEqual({ code, message: expect.stringMatching(message) });
});

describe('bodies the parser cannot read', () => {
  const post = async (encoding: string | null, data: Buffer | string, type = 'application/json') => {
    // serialize: send the bytes as given (superagent would JSON-encode a Buffer under a JSON type).
    const req = (await as('planner'))('post', '/api/windows').set('Content-Type', type).serialize((bytes: string) => bytes);
    return (encoding ? req.set('Content-Encoding', encoding) : req).send(data);
  };
  const json = JSON.stringify(windowBody({ title: 'Zipped' }));

  test.each([
    ['gzip with data that is not gzip answers 400 BAD_ENCODING', 'gzip', Buffer.from(json), 400, 'BAD_ENCODING'],
    ['br with data that is not brotli answers 400 BAD_ENCODING', 'br', Buffer.from('not brotli at all'), 400, 'BAD_ENCODING'],
    ['deflate with data that is not deflate answers 400 BAD_ENCODING', 'deflate', Buffer.from('plain'), 400, 'BAD_ENCODING'],
    ['an unknown encoding answers 415 BAD_ENCODING (RFC 9110 §15.5.16)', 'x-unknown', Buffer.from(json), 415, 'BAD_ENCODING'],
    ['gzip holding invalid JSON answers 400 BAD_JSON', 'gzip', gzipSync('{"title":'), 400, 'BAD_JSON'],
    ['gzip holding a NUL in the title answers 400 BAD_TEXT', 'gzip', gzipSync(JSON.stringify(windowBody({ title: '\u0000' }))), 400, 'BAD_TEXT'],
    ['invalid JSON answers 400 BAD_JSON', null, '{"title": ', 400, 'BAD_JSON'],
  ] as const)('%s', async (_what, encoding, data, status, code) => {
    const before = await windowCount();
    const res = await post(encoding, data);
    expect(res.status).toBe(status);
    expect(res.body.error.code).toBe(code);
    expect(await windowCount()).toBe(before);
  });

  test('an unsupported charset answers 415 BAD_CHARSET', async () => {
    const res = await post(null, json, 'application/json; charset=x-klingon');
    expect(res.status).toBe(415);
    expect(res.body.error.code).toBe('BAD_CHARSET');
  });

  test('a body over the limit answers 413 PAYLOAD_TOO_LARGE', async () => {
    const res = await post(null, JSON.stringify(windowBody({ title: 'x'.repeat(5_000_000) })));
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe('PAYLOAD_TOO_LARGE');
  });
});

test('a cookie holding a NUL answers 401 or 400, never 500', async () => {
  const res = await request(ctx.app).get('/api/me').set('Cookie', 'slackwater_session=a%00b.c%00d');
  expect([400, 401]).toContain(res.status);
});
