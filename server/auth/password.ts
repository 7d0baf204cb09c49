// Password hashing with argon2id (the @node-rs/argon2 default algorithm and parameters).
import { hash, verify } from '@node-rs/argon2';

export function hashPassword(password: string): Promise<string> {
  return hash(password);
}

/** False for a wrong password and for a malformed stored hash alike. */
export async function verifyPassword(passwordHash: string, password: string): Promise<boolean> {
  try {
    return await verify(passwordHash, password);
  } catch {
    return false;
  }
}

let dummyHash: Promise<string> | null = null;

/**
 * Runs one verification that always fails, so an unknown e-mail costs about as long as a known
 * one with a wrong password (no timing hint about which addresses have accounts).
 */
export async function verifyDummyPassword(password: string): Promise<false> {
  dummyHash ??= hash('slackwater-dummy-password-never-valid');
  await verifyPassword(await dummyHash, password);
  return false;
}
