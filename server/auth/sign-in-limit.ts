// Sign-in rate limiting per client IP and e-mail address; only failed attempts count.
import type { RequestHandler } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import { RateLimitedError } from '../errors';

export type SignInLimit = { windowMs: number; max: number };

export function signInRateLimit({ windowMs, max }: SignInLimit): RequestHandler {
  return rateLimit({
    windowMs,
    limit: max,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    // Successful sign-ins do not count, so a user who signs in and out often is never locked out.
    skipSuccessfulRequests: true,
    keyGenerator: (req) => {
      const email = typeof req.body?.email === 'string' ? req.body.email.trim().toLowerCase() : '';
      return `${ipKeyGenerator(req.ip ?? 'unknown')}|${email}`;
    },
    handler: (_req, _res, next) => next(new RateLimitedError()),
  });
}
