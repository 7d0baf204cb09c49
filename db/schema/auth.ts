// Users, credentials, sessions and role grants.
import { pgTable, text, timestamp, primaryKey, uniqueIndex, index, bigserial, boolean } from 'drizzle-orm/pg-core';
import { tenants } from './network';

export const ROLES = ['admin', 'engineer', 'planner', 'approver', 'tenant'] as const;
export type Role = (typeof ROLES)[number];

export const users = pgTable(
  'users',
  {
    id: text('id').primaryKey(),
    email: text('email').notNull(),
    name: text('name').notNull(),
    /** set for users holding the `tenant` role: the one tenant they belong to */
    tenantId: text('tenant_id').references(() => tenants.id, { onDelete: 'restrict' }),
    /** IANA zone the user reads times in; null = the network's zone (shared/time-zone.ts) */
    timeZone: text('time_zone'),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    /** true from the invitation until the invitee sets a password (or signs in with single sign-on) */
    invitationPending: boolean('invitation_pending').notNull().default(false),
    /** set while the account is deactivated: no sign-in, no session; its history stays */
    deactivatedAt: timestamp('deactivated_at', { withTimezone: true }),
  },
  (t) => [uniqueIndex('users_email_key').on(t.email)],
);

export const passwordCredentials = pgTable('password_credentials', {
  userId: text('user_id')
    .primaryKey()
    .references(() => users.id, { onDelete: 'cascade' }),
  /** argon2id PHC string */
  passwordHash: text('password_hash').notNull(),
  updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
});

export const sessions = pgTable(
  'sessions',
  {
    id: text('id').primaryKey(),
    /** SHA-256 of the token's secret part; the secret itself is never stored */
    secretHash: text('secret_hash').notNull(),
    userId: text('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    lastActiveAt: timestamp('last_active_at', { withTimezone: true }).notNull().defaultNow(),
    /** a short label of the browser at sign-in ("Firefox on Linux"), shown in the owner's session list */
    userAgent: text('user_agent'),
    /** the client address at sign-in, shown in the owner's session list */
    address: text('address'),
  },
  (t) => [index('sessions_user_idx').on(t.userId)],
);

export const SIGN_IN_KEY_KINDS = ['account', 'address'] as const;

/** One row per counted sign-in attempt; rows older than the limit's window no longer count and are pruned. */
export const signInFailures = pgTable(
  'sign_in_failures',
  {
    id: bigserial('id', { mode: 'number' }).primaryKey(),
    keyKind: text('key_kind', { enum: SIGN_IN_KEY_KINDS }).notNull(),
    /** the normalised e-mail address (account) or the client address or IPv6 prefix (address) */
    key: text('key').notNull(),
    at: timestamp('at', { withTimezone: true }).notNull(),
  },
  (t) => [index('sign_in_failures_key_idx').on(t.keyKind, t.key, t.at), index('sign_in_failures_at_idx').on(t.at)],
);

export const roleGrants = pgTable(
  'role_grants',
  {
    userId: text('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    role: text('role', { enum: ROLES }).notNull(),
    grantedAt: timestamp('granted_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [primaryKey({ columns: [t.userId, t.role] })],
);
