// The single sign-on settings row (at most one, id 'default').
import { eq } from 'drizzle-orm';
import type { Queryable } from '../../../db/client';
import { ssoSettings } from '../../../db/schema';

const SETTINGS_ID = 'default';

export type SsoSettingsRow = typeof ssoSettings.$inferSelect;
export type SsoSettingsValues = Omit<SsoSettingsRow, 'id' | 'updatedAt'>;

export async function getSsoSettings(db: Queryable): Promise<SsoSettingsRow | null> {
  const [row] = await db.select().from(ssoSettings).where(eq(ssoSettings.id, SETTINGS_ID)).limit(1);
  return row ?? null;
}

/** The row locked for the rest of the transaction, so two admins saving at once save one after the other. */
export async function getSsoSettingsForUpdate(db: Queryable): Promise<SsoSettingsRow | null> {
  const [row] = await db.select().from(ssoSettings).where(eq(ssoSettings.id, SETTINGS_ID)).for('update');
  return row ?? null;
}

export async function upsertSsoSettings(db: Queryable, values: SsoSettingsValues & { updatedAt: Date }): Promise<void> {
  await db.insert(ssoSettings).values({ id: SETTINGS_ID, ...values })
    .onConflictDoUpdate({ target: ssoSettings.id, set: values });
}
