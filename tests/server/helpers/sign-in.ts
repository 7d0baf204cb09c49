// Signs a test user in through the real route and returns the Cookie header value.
import type express from 'express';
import request from 'supertest';
import { sessionCookieFrom, TEST_PASSWORD } from './test-app';

export async function signInAs(app: express.Application, email: string): Promise<string> {
  const res = await request(app).post('/api/auth/sign-in').send({ email, password: TEST_PASSWORD });
  if (res.status !== 200) throw new Error(`sign-in as ${email} failed: ${res.status} ${JSON.stringify(res.body)}`);
  return sessionCookieFrom(res);
}

export type Method = 'get' | 'post' | 'patch' | 'put' | 'delete';
export type AsUser<Who extends string> = (who: Who) => Promise<(method: Method, path: string) => request.Test>;

/** `as(who)` signs `who` in once (cookie kept for the file) and returns a request maker carrying that cookie. */
export function signedInRequests<Who extends string>(app: express.Application, emailOf: (who: Who) => string): AsUser<Who> {
  const cookies = new Map<Who, string>();
  return async (who) => {
    if (!cookies.has(who)) cookies.set(who, await signInAs(app, emailOf(who)));
    const cookie = cookies.get(who)!;
    return (method, path) => request(app)[method](path).set('Cookie', cookie);
  };
}
