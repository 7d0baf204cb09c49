// Signs a test user in through the real route and returns the Cookie header value.
import type express from 'express';
import request from 'supertest';
import { sessionCookieFrom, TEST_PASSWORD } from './test-app';

export async function signInAs(app: express.Application, email: string): Promise<string> {
  const res = await request(app).post('/api/auth/sign-in').send({ email, password: TEST_PASSWORD });
  if (res.status !== 200) throw new Error(`sign-in as ${email} failed: ${res.status} ${JSON.stringify(res.body)}`);
  return sessionCookieFrom(res);
}
