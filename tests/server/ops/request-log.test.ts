// Request logs: one JSON line per request with its id (also returned as X-Request-Id), method, route pattern,
// status, duration and user id; never a body, password, one-time code, cookie or NUL; what a service logs for a
// request carries the same id.
import request from 'supertest';
import { createLogger } from '../../../server/log/logger';
import type { JobQueue } from '../../../server/jobs/queue';
import { createRecordingQueue } from '../helpers/jobs';
import { signInAs } from '../helpers/sign-in';
import { setupTestApp, TEST_PASSWORD, type TestContext } from '../helpers/test-app';

let ctx: TestContext;
const output: string[] = [];
let app: ReturnType<TestContext['makeApp']>;

/** A queue whose mail sending is down: the invitation service then logs a warning through the request's logger. */
function mailDownQueue(): JobQueue {
  const q = createRecordingQueue();
  return { ...q, sendMail: async () => { throw new Error('queue unreachable'); } };
}

beforeAll(async () => {
  ctx = await setupTestApp();
  const logger = createLogger({ level: 'debug', format: 'json', destination: { write: (line: string) => { output.push(line); } } });
  app = ctx.makeApp({ logger, jobs: mailDownQueue() });
});
afterAll(() => ctx.close());
beforeEach(() => { output.length = 0; });

type Line = Record<string, unknown>;
const lines = (): Line[] => output.join('').split('\n').filter(Boolean).map((l) => JSON.parse(l) as Line);
const requestLines = () => lines().filter((l) => l.msg === 'request completed' || l.msg === 'request failed');

test('a sign-in with a password and a cookie, a one-time code and a NUL leave none of them in the log', async () => {
  const cookieSecret = 'slackwater_session=cookie-secret-4711.abcdef';
  const badPassword = 'hunter2-Password-Secret';
  await request(app).post('/api/auth/sign-in').set('Cookie', cookieSecret).send({ email: ctx.users.planner.email, password: badPassword });
  const session = await signInAs(app, ctx.users.engineer.email);
  const code = await request(app).post('/api/me/otp/confirm').set('Cookie', session).send({ code: '907153' });
  const nul = await request(app).post('/api/windows').set('Cookie', session)
    .send({ title: 'nul-title-secret\u0000x', startsAt: '2031-03-01T01:00:00Z', endsAt: '2031-03-01T03:00:00Z', elements: [] });
  expect(code.status).toBeGreaterThanOrEqual(400);
  expect(nul.status).toBe(400);

  const text = output.join('');
  expect(requestLines()).toHaveLength(4);
  for (const secret of [badPassword, TEST_PASSWORD, 'cookie-secret-4711', session.split('=')[1], '907153', 'nul-title-secret', '\\u0000', ctx.users.planner.email]) {
    expect(text).not.toContain(secret);
  }
  expect(requestLines().map((l) => [l.method, l.route, l.status])).toEqual([
    ['POST', '/api/auth/sign-in', 401], ['POST', '/api/auth/sign-in', 200], ['POST', '/api/me/otp/confirm', code.status],
    // Refused by the input checks before any route matched.
    ['POST', null, 400],
  ]);
});

test('the request id is returned as X-Request-Id and is the line\'s reqId; a route pattern and the user id, never the path', async () => {
  const session = await signInAs(app, ctx.users.planner.email);
  output.length = 0;
  const res = await request(app).get('/api/windows/w-no-such-window-42').set('Cookie', session);
  expect(res.status).toBe(404);
  const id = res.headers['x-request-id'];
  expect(id).toMatch(/^[0-9a-f-]{36}$/);
  const [line] = requestLines();
  expect(line).toMatchObject({ reqId: id, method: 'GET', route: '/api/windows/:id', status: 404, userId: ctx.users.planner.id, level: 30 });
  expect(typeof line.durationMs).toBe('number');
  expect(output.join('')).not.toContain('w-no-such-window-42');
});

test.each([
  ['a proxy\'s id is kept', 'edge-7f3a9c01.lb', true],
  ['an id with spaces and markup is replaced', 'bad id <script>', false],
  ['an over-long id is replaced', 'x'.repeat(200), false],
])('%s', async (_what, incoming, kept) => {
  const res = await request(app).get('/api/me').set('X-Request-Id', incoming);
  const id = res.headers['x-request-id'];
  expect(id === incoming).toBe(kept);
  expect(requestLines()[0]).toMatchObject({ reqId: id, route: '/api/me', userId: null });
  if (!kept) expect(output.join('')).not.toContain(incoming);
});

test('a service\'s warning during a request carries the request\'s id and the error\'s safe fields', async () => {
  const admin = await signInAs(app, ctx.users.admin.email);
  output.length = 0;
  const res = await request(app).post('/api/invitations').set('Cookie', admin)
    .send({ email: `log-${ctx.prefix}@test.example`, name: 'Logged Person', roles: ['planner'] });
  expect(res.status).toBe(201);
  expect(res.body.mailQueued).toBe(false);
  const warning = lines().find((l) => l.msg === 'the invitation mail could not be queued');
  expect(warning).toMatchObject({ reqId: res.headers['x-request-id'], level: 40, err: { type: 'Error', message: 'queue unreachable' } });
  expect(output.join('')).not.toContain(`log-${ctx.prefix}`);
});
