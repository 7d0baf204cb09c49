// TOTP codes: RFC 6238 test vectors, the ±1-step window, and replay refusal.
import { checkOtpCode, decodeOtpKey, encodeOtpKey, otpCodeForStep, otpKeyUri, otpStepAt } from '../../../server/auth/otp';

// RFC 6238 Appendix B, SHA-1 rows: seed = the ASCII string "12345678901234567890", X = 30 s, T0 = 0, 8 digits.
// T = 59 → 94287082 is confirmed; the other rows are from memory (and agree with @oslojs/otp here).
// A 6-digit code is the same value mod 10^6 (RFC 4226 §5.3), i.e. its last six digits.
const RFC_KEY = new TextEncoder().encode('12345678901234567890');
const RFC_6238_SHA1: [number, string][] = [
  [59, '94287082'], [1111111109, '07081804'], [1111111111, '14050471'],
  [1234567890, '89005924'], [2000000000, '69279037'], [20000000000, '65353130'],
];

test.each(RFC_6238_SHA1)('RFC 6238 Appendix B, SHA-1: T = %i s gives %s (8 digits) and its last six digits', (unixSeconds, expected) => {
  const step = otpStepAt(new Date(unixSeconds * 1000));
  expect(otpCodeForStep(RFC_KEY, step, 8)).toBe(expected);
  expect(otpCodeForStep(RFC_KEY, step)).toBe(expected.slice(2));
});

test('the RFC 6238 time step is floor(seconds / 30): 59 s → 1, 1111111109 s → 37037036 (RFC 6238 Appendix B table)', () => {
  expect(otpStepAt(new Date(59_000))).toBe(1);
  expect(otpStepAt(new Date(1_111_111_109_000))).toBe(0x23523ec);
});

test('a code is accepted for the current step and one step either side, not two', () => {
  const at = new Date(1_234_567_890_000);
  const now = otpStepAt(at);
  for (const offset of [-1, 0, 1]) {
    expect(checkOtpCode(RFC_KEY, otpCodeForStep(RFC_KEY, now + offset), at, null)).toEqual({ ok: true, step: now + offset });
  }
  for (const offset of [-2, 2]) {
    expect(checkOtpCode(RFC_KEY, otpCodeForStep(RFC_KEY, now + offset), at, null)).toEqual({ ok: false, reason: 'invalid' });
  }
  expect(checkOtpCode(RFC_KEY, '000000', at, null).ok).toBe(otpCodeForStep(RFC_KEY, now) === '000000');
});

test('a code of a step at or before the last used one is a replay', () => {
  const at = new Date(2_000_000_000_000);
  const now = otpStepAt(at);
  const code = otpCodeForStep(RFC_KEY, now);
  expect(checkOtpCode(RFC_KEY, code, at, now)).toEqual({ ok: false, reason: 'replayed' });
  expect(checkOtpCode(RFC_KEY, otpCodeForStep(RFC_KEY, now - 1), at, now)).toEqual({ ok: false, reason: 'replayed' });
  expect(checkOtpCode(RFC_KEY, otpCodeForStep(RFC_KEY, now + 1), at, now)).toEqual({ ok: true, step: now + 1 });
});

test('keys round-trip through base32 and the otpauth URI carries them with the RFC 6238 defaults', () => {
  const text = encodeOtpKey(RFC_KEY);
  // RFC 4648 §10 style base32 of the RFC 6238 seed (commonly quoted as GEZDGNBVGY3TQOJQGEZDGNBVGY3TQOJQ; secondary).
  expect(text).toBe('GEZDGNBVGY3TQOJQGEZDGNBVGY3TQOJQ');
  expect(decodeOtpKey(text)).toEqual(RFC_KEY);
  const uri = new URL(otpKeyUri('approver@demo.test', RFC_KEY));
  expect(uri.protocol).toBe('otpauth:');
  expect(Object.fromEntries(uri.searchParams)).toMatchObject({ secret: text, algorithm: 'SHA1', digits: '6', period: '30', issuer: 'Slackwater' });
});
