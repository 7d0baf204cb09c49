// The signed-in user's own sessions: what the Security screen lists; never any part of a session token.
import { z } from 'zod';

const instant = z.iso.datetime({ offset: true });

export const sessionInfoSchema = z.object({
  /** a name derived from the session, for ending it; not part of its token */
  id: z.string().regex(/^[0-9a-f]{32}$/),
  createdAt: instant,
  lastActiveAt: instant,
  /** when the session ends unless used again: idle expiry, capped by the absolute lifetime from sign-in */
  expiresAt: instant,
  /** the session this request came with ("this device") */
  current: z.boolean(),
  /** a short label of the browser at sign-in, e.g. "Firefox on Linux" */
  userAgent: z.string().nullable(),
  /** the client address at sign-in */
  address: z.string().nullable(),
});
export type SessionInfo = z.infer<typeof sessionInfoSchema>;

export const sessionListSchema = z.object({ sessions: z.array(sessionInfoSchema) });
export type SessionList = z.infer<typeof sessionListSchema>;

export const sessionHandleSchema = z.string().regex(/^[0-9a-f]{32}$/, 'A session id is 32 hexadecimal characters.');

export const revokeAllSessionsResponseSchema = z.object({ ended: z.number().int().min(0) });
