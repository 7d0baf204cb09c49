// First admin of an instance started without the demo: the set-up link's check and the form it opens.
import { z } from 'zod';

/** Shortest password the first admin may choose (also checked for ADMIN_PASSWORD at start). */
export const ADMIN_PASSWORD_MIN_CHARS = 12;

export const newAdminSchema = z.object({
  name: z.string().trim().min(1, 'Enter your name').max(120, 'Use at most 120 characters'),
  email: z.email('Enter a valid e-mail address').max(254),
  password: z.string()
    .min(ADMIN_PASSWORD_MIN_CHARS, `Use at least ${ADMIN_PASSWORD_MIN_CHARS} characters`)
    .max(1024, 'Use at most 1024 characters'),
});
export type NewAdmin = z.infer<typeof newAdminSchema>;

/** A set-up token as printed: 32 random bytes in base64url (RFC 4648 §5), without padding. */
export const setUpTokenSchema = z.string().regex(/^[A-Za-z0-9_-]{43}$/, 'This set-up link is not complete');

/** POST /api/set-up */
export const setUpRequestSchema = newAdminSchema.extend({ token: setUpTokenSchema });
export type SetUpRequest = z.infer<typeof setUpRequestSchema>;

/** GET /api/set-up/:token when the link still works (otherwise 404 SETUP_LINK_INVALID). */
export const setUpLinkStatusSchema = z.object({ valid: z.literal(true) });
