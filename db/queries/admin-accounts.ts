// Admin accounts at setup: is there one yet, and the one ADMIN_EMAIL / ADMIN_PASSWORD ask for.
import { randomUUID } from 'node:crypto';
import { count, eq, sql } from 'drizzle-orm';
import type { Queryable } from '../client';
import { passwordCredentials, roleGrants, users } from '../schema';

export async function countAdmins(db: Queryable): Promise<number> {
  const [row] = await db.select({ n: count() }).from(roleGrants).where(eq(roleGrants.role, 'admin'));
  return row?.n ?? 0;
}

/** The user with this e-mail (matched case-insensitively, as sign-in does), or null. */
export async function findUserByEmail(db: Queryable, email: string): Promise<{ id: string; email: string } | null> {
  const [row] = await db.select({ id: users.id, email: users.email }).from(users)
    .where(sql`lower(${users.email}) = ${email.trim().toLowerCase()}`).limit(1);
  return row ?? null;
}

/** A new user holding the admin role, signing in with the given argon2id hash; returns its id. */
export async function insertAdminAccount(
  db: Queryable, { email, name, passwordHash, now }: { email: string; name: string; passwordHash: string; now: Date },
): Promise<string> {
  const id = `user-${randomUUID()}`;
  await db.insert(users).values({ id, email: email.trim(), name, createdAt: now });
  await db.insert(passwordCredentials).values({ userId: id, passwordHash, updatedAt: now });
  await db.insert(roleGrants).values({ userId: id, role: 'admin', grantedAt: now });
  return id;
}
