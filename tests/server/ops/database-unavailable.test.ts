// Connection-class failures (refused, reset, ended by a restart, no connection in time) are told apart from every
// other error; the API answers them 503 DATABASE_UNAVAILABLE with Retry-After; retryWhileDatabaseUnavailable
// waits them out and nothing else.
import request from 'supertest';
import { createDb } from '../../../db/client';
import { createApp } from '../../../server/app';
import { generateSessionToken } from '../../../server/auth/session-token';
import { isDatabaseUnavailable, retryWhileDatabaseUnavailable } from '../../../server/db-unavailable';
import { createRecordingQueue } from '../helpers/jobs';
import { testConfig } from '../helpers/test-app';

const pgError = (code: string, message = 'x') => Object.assign(new Error(message), { code });
/** Shaped like drizzle-orm's DrizzleQueryError wrapping the driver's error. */
const wrapped = (cause: unknown) => Object.assign(new Error('Failed query: select 1\nparams: '), { name: 'DrizzleQueryError', cause });

test.each([
  ['ECONNREFUSED', pgError('ECONNREFUSED', 'connect ECONNREFUSED 127.0.0.1:5432')],
  ['ECONNRESET', pgError('ECONNRESET', 'read ECONNRESET')],
  ['57P01 admin shutdown', pgError('57P01', 'terminating connection due to administrator command')],
  ['57P02 crash shutdown', pgError('57P02')],
  ['57P03 cannot connect now', pgError('57P03', 'the database system is shutting down')],
  ['08006 connection failure', pgError('08006')],
  ['08001 unable to connect', pgError('08001')],
  ['connection terminated', new Error('Connection terminated unexpectedly')],
  ['pool connect timeout', new Error('timeout exceeded when trying to connect')],
  ['wrapped by drizzle', wrapped(pgError('57P01'))],
  ['AggregateError of refusals', Object.assign(new AggregateError([pgError('ECONNREFUSED'), pgError('ECONNREFUSED')], ''), {})],
])('%s is the database being unavailable', (_name, err) => {
  expect(isDatabaseUnavailable(err)).toBe(true);
});

test.each([
  ['unique violation', pgError('23505')],
  ['syntax error', wrapped(pgError('42601'))],
  ['NUL in text', pgError('22021')],
  ['a plain error', new Error('boom')],
  ['not an error', 'ECONNREFUSED'],
  ['null', null],
])('%s is not', (_name, err) => {
  expect(isDatabaseUnavailable(err)).toBe(false);
});

describe('against a database that refuses connections', () => {
  const broken = createDb('postgres://postgres@127.0.0.1:1/nowhere', { max: 1 });
  const app = createApp({ db: broken.db, pool: broken.pool, config: testConfig(), jobs: createRecordingQueue(), log: () => undefined });
  afterAll(() => broken.pool.end());

  test.each([
    ['a signed-in read (the session look-up)', () => request(app).get('/api/windows').set('Cookie', `slackwater_session=${generateSessionToken().token}`)],
    ['a sign-in', () => request(app).post('/api/auth/sign-in').send({ email: 'a@b.test', password: 'whatever-1' })],
  ])('%s answers 503 DATABASE_UNAVAILABLE with Retry-After, never 500', async (_name, send) => {
    const res = await send();
    expect(res.status).toBe(503);
    expect(res.body.error.code).toBe('DATABASE_UNAVAILABLE');
    expect(res.body.error.message).not.toMatch(/ECONNREFUSED|127\.0\.0\.1|select/i);
    expect(Number(res.headers['retry-after'])).toBeGreaterThan(0);
  });
});

test('retryWhileDatabaseUnavailable tries again through an outage and returns the result', async () => {
  let calls = 0;
  const waits: number[] = [];
  const result = await retryWhileDatabaseUnavailable(async () => {
    calls++;
    if (calls < 3) throw pgError('57P03');
    return 'stored';
  }, { firstDelayMs: 1, onWait: (_e, waited) => waits.push(waited) });
  expect([result, calls, waits.length]).toEqual(['stored', 3, 2]);
});

test('retryWhileDatabaseUnavailable rethrows any other error at once', async () => {
  let calls = 0;
  await expect(retryWhileDatabaseUnavailable(async () => { calls++; throw pgError('23505', 'duplicate'); }, { firstDelayMs: 1 }))
    .rejects.toThrow('duplicate');
  expect(calls).toBe(1);
});

test('retryWhileDatabaseUnavailable gives up after its bound with the last error', async () => {
  await expect(retryWhileDatabaseUnavailable(async () => { throw pgError('ECONNREFUSED', 'refused'); }, { firstDelayMs: 5, maxWaitMs: 20 }))
    .rejects.toThrow('refused');
});
