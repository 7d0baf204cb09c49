// Demo accounts: users, argon2id password credentials and one role grant each.
import { hash } from '@node-rs/argon2';
import { and, eq, inArray, isNull } from 'drizzle-orm';
import { users, passwordCredentials, roleGrants } from '../schema';
import { DEMO_PASSWORD, DEMO_USERS } from './demo-users';
import type { Tx } from '../client';

/** Creates the demo users that are missing (hashing only for those); returns how many were new. */
export async function seedDemoUsers(tx: Tx, tenantId: string | null): Promise<number> {
  const emails = DEMO_USERS.map((u) => u.email);
  const existing = await tx.select({ email: users.email }).from(users).where(inArray(users.email, emails));
  const have = new Set(existing.map((u) => u.email));
  const missing = DEMO_USERS.filter((u) => !have.has(u.email));
  let created = 0;
  for (const u of missing) {
    const inserted = await tx.insert(users).values({
      id: u.id, email: u.email, name: u.name, tenantId: u.role === 'tenant' ? tenantId : null,
    }).onConflictDoNothing().returning({ id: users.id });
    if (inserted.length === 0) continue; // the id is taken by an account whose e-mail was changed
    // @node-rs/argon2's hash() defaults to argon2id.
    await tx.insert(passwordCredentials).values({ userId: u.id, passwordHash: await hash(DEMO_PASSWORD) });
    await tx.insert(roleGrants).values({ userId: u.id, role: u.role }).onConflictDoNothing();
    created += 1;
  }
  // A database seeded before any tenant existed gets its tenant account attached later.
  if (tenantId) {
    const tenantUser = DEMO_USERS.find((u) => u.role === 'tenant');
    if (tenantUser) {
      await tx.update(users).set({ tenantId }).where(and(eq(users.email, tenantUser.email), isNull(users.tenantId)));
    }
  }
  return created;
}
