// Adds the signed-in user (set by the session middleware) to Express's Request type.
import type { Me } from '../../shared/api';

export type SessionAuth = {
  sessionId: string; user: Me; lastActiveAt: Date;
  /** when the session ends unless used again (idle expiry, capped by the absolute lifetime) */
  expiresAt: Date;
  refreshed: boolean;
};

declare module 'express-serve-static-core' {
  interface Request {
    /** The signed-in user, when the request carries a valid session cookie. */
    user?: Me;
    auth?: SessionAuth;
  }
}
