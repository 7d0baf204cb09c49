// What a person reads when a request fails: the app's own words, never the API's (method, path, route wording).
import { z } from 'zod';
import { apiFetch, ApiError } from '@/hooks/api-fetch';

const realFetch = global.fetch;
afterEach(() => {
  global.fetch = realFetch;
});

function answer(status: number, body: unknown) {
  global.fetch = jest.fn(async () => new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } }));
}

async function failureOf(path: string): Promise<ApiError> {
  try {
    await apiFetch(path, z.object({ ok: z.literal(true) }));
  } catch (error) {
    if (error instanceof ApiError) return error;
    throw error;
  }
  throw new Error('the request did not fail');
}

test('an unknown route (also what a tenant gets for staff-only data) reads as "not available", with no method or path', async () => {
  answer(404, { error: { code: 'ROUTE_NOT_FOUND', message: 'No API route for GET /api/plans/p-1.' } });
  const error = await failureOf('/api/plans/p-1');
  expect(error.code).toBe('ROUTE_NOT_FOUND');
  expect(error.message).toMatch(/not available to you/);
  expect(error.message).not.toMatch(/API|GET|\/api\//);
});

test('other server messages are already written for people and pass through unchanged', async () => {
  answer(409, { error: { code: 'WINDOW_FROZEN', message: 'The network is frozen for the year-end from 20 Dec 2026.' } });
  expect((await failureOf('/api/windows')).message).toBe('The network is frozen for the year-end from 20 Dec 2026.');
});

test('a reply that does not match the contract says so without naming the address', async () => {
  answer(200, { ok: 'yes' });
  const error = await failureOf('/api/windows/w-1');
  expect(error.code).toBe('BAD_RESPONSE');
  expect(error.message).not.toContain('/api/');
  answer(502, '<html>bad gateway</html>');
  const gateway = await failureOf('/api/windows/w-1');
  expect(gateway.status).toBe(502);
  expect(gateway.message).not.toMatch(/502|error body/);
});
