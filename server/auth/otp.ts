// Time-based one-time codes (TOTP, RFC 6238 over HOTP, RFC 4226): 30-second steps, 6 digits, HMAC-SHA-1 — what
// common authenticator apps use by default. Time is passed in, so verification is testable without a clock.
import { generateHOTP, verifyHOTP, createTOTPKeyURI } from '@oslojs/otp';
import { decodeBase32IgnorePadding, encodeBase32NoPadding } from '@oslojs/encoding';

export const OTP_STEP_SECONDS = 30;
export const OTP_DIGITS = 6;
/** Steps either side of now that still count: authenticator clocks drift, and typing a code takes time. */
export const OTP_DRIFT_STEPS = 1;
/** 160 bits, the key length RFC 4226 §4 recommends for HMAC-SHA-1. */
const KEY_BYTES = 20;
const ISSUER = 'Slackwater';

export function newOtpKey(): Uint8Array {
  return crypto.getRandomValues(new Uint8Array(KEY_BYTES));
}

export const encodeOtpKey = (key: Uint8Array): string => encodeBase32NoPadding(key);
export const decodeOtpKey = (keyBase32: string): Uint8Array => decodeBase32IgnorePadding(keyBase32);

/** The RFC 6238 time step T = floor(unix seconds / 30). */
export function otpStepAt(at: Date): number {
  return Math.floor(at.getTime() / 1000 / OTP_STEP_SECONDS);
}

export function otpCodeForStep(key: Uint8Array, step: number, digits = OTP_DIGITS): string {
  return generateHOTP(key, BigInt(step), digits);
}

export type OtpCheck = { ok: true; step: number } | { ok: false; reason: 'invalid' | 'replayed' };

/**
 * Accepts a code of the current step ±1; refuses a code whose step is not after `lastUsedStep`, so a code seen
 * over someone's shoulder (or an intercepted one) cannot be used a second time.
 */
export function checkOtpCode(key: Uint8Array, code: string, at: Date, lastUsedStep: number | null): OtpCheck {
  const now = otpStepAt(at);
  // Newest first: when two steps match (practically never), take the later one so replay protection holds.
  for (let step = now + OTP_DRIFT_STEPS; step >= now - OTP_DRIFT_STEPS; step--) {
    if (!verifyHOTP(key, BigInt(step), OTP_DIGITS, code)) continue;
    if (lastUsedStep !== null && step <= lastUsedStep) return { ok: false, reason: 'replayed' };
    return { ok: true, step };
  }
  return { ok: false, reason: 'invalid' };
}

export function otpKeyUri(accountName: string, key: Uint8Array): string {
  return createTOTPKeyURI(ISSUER, accountName, key, OTP_STEP_SECONDS, OTP_DIGITS);
}
