// Forgotten and changed passwords: the requests the sign-in, reset and Security screens send, and the answers.
import { z } from 'zod';

/** Shortest password a person may choose (the server's policy also judges strength). */
export const PASSWORD_MIN_CHARS = 12;
/** Longest password accepted anywhere. */
export const PASSWORD_MAX_CHARS = 1024;
/** How long a reset link works, in minutes. */
export const RESET_LINK_VALID_MINUTES = 60;

/** POST /api/auth/forgot-password */
export const forgotPasswordRequestSchema = z.object({ email: z.email('Enter a valid e-mail address').max(254) });
export type ForgotPasswordRequest = z.infer<typeof forgotPasswordRequestSchema>;

/** The one answer to every forgot-password request, whether or not an account uses the address. */
export const FORGOT_PASSWORD_ANSWER =
  `If an account uses this address, a link to choose a new password is on its way. It works once, for ${RESET_LINK_VALID_MINUTES} minutes.`;
export const forgotPasswordResponseSchema = z.object({ message: z.string() });

/** A reset token as mailed: 32 random bytes in base64url (RFC 4648 §5), without padding. */
export const resetTokenSchema = z.string().regex(/^[A-Za-z0-9_-]{43}$/, 'This reset link is not complete');

/** GET /api/auth/reset-password/:token when the link still works (otherwise 404 RESET_LINK_INVALID). */
export const resetLinkStatusSchema = z.object({ valid: z.literal(true) });

/** POST /api/auth/reset-password */
export const resetPasswordRequestSchema = z.object({
  token: resetTokenSchema,
  password: z.string().min(1, 'Enter a new password').max(PASSWORD_MAX_CHARS, `Use at most ${PASSWORD_MAX_CHARS} characters`),
});
export type ResetPasswordRequest = z.infer<typeof resetPasswordRequestSchema>;

/** POST /api/me/password */
export const changePasswordRequestSchema = z.object({
  currentPassword: z.string().min(1, 'Enter your current password').max(PASSWORD_MAX_CHARS),
  newPassword: z.string().min(1, 'Enter a new password').max(PASSWORD_MAX_CHARS, `Use at most ${PASSWORD_MAX_CHARS} characters`),
});
export type ChangePasswordRequest = z.infer<typeof changePasswordRequestSchema>;

/** After a change: how many of the user's other sessions were ended (this one stays). */
export const changePasswordResponseSchema = z.object({ otherSessionsEnded: z.number().int().min(0) });
export type ChangePasswordResponse = z.infer<typeof changePasswordResponseSchema>;
