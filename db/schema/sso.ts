// Single sign-on through OpenID Connect: the one issuer an admin configured, and which issuer account is which user.
import { boolean, index, jsonb, pgTable, primaryKey, text, timestamp } from 'drizzle-orm/pg-core';
import { users } from './auth';

/** A group on the issuer and the staff roles its members get here (tenant accounts never come through SSO). */
export type SsoGroupRoles = { group: string; roles: ('admin' | 'engineer' | 'planner' | 'approver')[] };

/** At most one row (id 'default'): the issuer settings an admin saved. */
export const ssoSettings = pgTable('sso_settings', {
  id: text('id').primaryKey(),
  enabled: boolean('enabled').notNull().default(false),
  /** the issuer identifier; its discovery document is at <issuer>/.well-known/openid-configuration */
  issuerUrl: text('issuer_url').notNull(),
  clientId: text('client_id').notNull(),
  /** WARNING: never sent back to the app; the settings answer says only whether one is set */
  clientSecret: text('client_secret').notNull(),
  /** the words on the sign-in button: "Sign in with <displayName>" */
  displayName: text('display_name').notNull(),
  /** the ID token claim holding the person's groups (a list of names) */
  groupsClaim: text('groups_claim').notNull().default('groups'),
  groupRoles: jsonb('group_roles').$type<SsoGroupRoles[]>().notNull().default([]),
  /** false: staff sign in through the issuer only; tenants keep their passwords */
  passwordSignInForStaff: boolean('password_sign_in_for_staff').notNull().default(true),
  updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
});

/** An issuer account (issuer + subject, never the e-mail, which may change) linked to the user it signs in as. */
export const ssoIdentities = pgTable(
  'sso_identities',
  {
    issuer: text('issuer').notNull(),
    subject: text('subject').notNull(),
    userId: text('user_id').notNull().references(() => users.id, { onDelete: 'cascade' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    lastSignInAt: timestamp('last_sign_in_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [primaryKey({ columns: [t.issuer, t.subject] }), index('sso_identities_user_idx').on(t.userId)],
);
