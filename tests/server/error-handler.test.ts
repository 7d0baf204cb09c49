// The error middleware: errors carrying a 4xx status answer with it and a code; a real 500 logs the route pattern
// and the error's safe fields (type, codes, message, stack frames), never the SQL parameters or query of a database error.
import express from 'express';
import request from 'supertest';
import { errorHandler } from '../../server/http/error-handler';

/** Shaped like an http-errors error, as body-parser, the router and multer raise them. */
const createError = (status: number, message: string, props: Record<string, unknown> = {}) =>
  Object.assign(new Error(message), { status, statusCode: status, expose: true, ...props });

function appThrowing(err: unknown, logged: string[]) {
  const app = express();
  app.get('/api/things/:id', () => { throw err; });
  app.use(errorHandler({ log: (message, detail) => logged.push(`${message}\n${JSON.stringify(detail)}`) }));
  return app;
}

/** Shaped like drizzle-orm's DrizzleQueryError wrapping a pg DatabaseError. */
function queryError(cause: object): Error {
  const err = new Error('Failed query: insert into "windows" ("title") values ($1)\nparams: secret-title');
  err.name = 'DrizzleQueryError';
  Object.assign(err, { query: 'insert into "windows" ("title") values ($1)', params: ['secret-title'], cause });
  return err;
}

test.each([
  [createError(400, 'Failed to decode param \'%E0\''), 400, 'BAD_REQUEST'],
  [Object.assign(new URIError('Failed to decode param \'%E0\''), { status: 400 }), 400, 'BAD_URL'],
  [createError(404, 'nope'), 404, 'HTTP_404'],
  [createError(413, 'too big', { type: 'entity.too.large' }), 413, 'PAYLOAD_TOO_LARGE'],
  [createError(415, 'nope', { type: 'encoding.unsupported' }), 415, 'BAD_ENCODING'],
  [Object.assign(new Error('Unexpected field'), { statusCode: 400 }), 400, 'BAD_REQUEST'],
])('an error carrying status %#: answers its status and code, logs nothing, never quotes the request', async (err, status, code) => {
  const logged: string[] = [];
  const res = await request(appThrowing(err, logged)).get('/api/things/1');
  expect(res.status).toBe(status);
  expect(res.body.error.code).toBe(code);
  expect(res.body.error.message).not.toMatch(/%E0|nope|too big|Unexpected field/);
  expect(logged).toEqual([]);
});

test('PostgreSQL refusing a NUL (SQLSTATE 22021) answers 400 BAD_TEXT and logs nothing', async () => {
  const logged: string[] = [];
  const res = await request(appThrowing(queryError({ name: 'error', code: '22021', message: 'invalid byte sequence' }), logged)).get('/api/things/1');
  expect(res.status).toBe(400);
  expect(res.body.error.code).toBe('BAD_TEXT');
  expect(logged).toEqual([]);
});

test('a real 500 logs the route pattern, names and stack, but not the query, params or pg detail', async () => {
  const logged: string[] = [];
  const cause = Object.assign(new Error('duplicate key value violates unique constraint "windows_pkey"'), {
    code: '23505', detail: 'Key (id)=(secret-id) already exists.', where: 'secret-where',
  });
  const res = await request(appThrowing(queryError(cause), logged)).get('/api/things/secret-path-value');
  expect(res.status).toBe(500);
  expect(res.body).toEqual({ error: { code: 'INTERNAL', message: 'Something went wrong on the server.' } });
  expect(logged).toHaveLength(1);
  const [line] = logged;
  expect(line).toMatch(/^INTERNAL on GET \/api\/things\/:id/);
  const detail = JSON.parse(line.slice(line.indexOf('\n') + 1));
  expect(detail).toMatchObject({
    type: 'DrizzleQueryError', message: expect.stringMatching(/^database query failed/),
    cause: { type: 'Error', pgCode: '23505', message: 'duplicate key value violates unique constraint "windows_pkey"' },
  });
  expect(detail.stack).toMatch(/^\s+at /);
  for (const secret of ['secret-title', 'secret-id', 'secret-where', 'secret-path-value', 'insert into', 'params']) {
    expect(line).not.toContain(secret);
  }
});

test('a thrown non-error still answers 500 and logs only its type', async () => {
  const logged: string[] = [];
  const res = await request(appThrowing('a string with secret', logged)).get('/api/things/1');
  expect(res.status).toBe(500);
  expect(logged[0]).not.toContain('secret');
});
