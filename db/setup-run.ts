// Setup after migrations: the demo (unless SEED_DEMO=false), the admin from ADMIN_EMAIL / ADMIN_PASSWORD, and a
// one-time set-up link when an empty instance has no admin and no admin was asked for.
import { hash } from '@node-rs/argon2';
import type { Db } from './client';
import { countAdmins, findUserByEmail, insertAdminAccount } from './queries/admin-accounts';
import { replaceUnusedLink } from './queries/one-time-links';
import { seedDemo, type SeedSummary } from './seed';
import type { SetupEnv } from './setup-env';

/** How long a printed set-up link works. */
export const SET_UP_LINK_VALID_SECONDS = 24 * 60 * 60;

export interface SetupOutcome {
  seeded: SeedSummary | null;
  admin: 'created' | 'exists' | 'not-asked';
  /** the printed link's token, when one was made */
  setUpToken: string | null;
}

async function ensureEnvAdmin(db: Db, admin: NonNullable<SetupEnv['admin']>, now: Date, log: (line: string) => void) {
  const existing = await findUserByEmail(db, admin.email);
  if (existing) {
    // WARNING: never overwrite a password from the environment: a restart with an old ADMIN_PASSWORD would undo
    // a change the admin made in the app.
    log(`setup: an account for ${existing.email} already exists; ADMIN_PASSWORD was not applied (its password stays as it is)`);
    return 'exists' as const;
  }
  // @node-rs/argon2's hash() defaults to argon2id, like the demo accounts'.
  const passwordHash = await hash(admin.password);
  await db.transaction(async (tx) => {
    await insertAdminAccount(tx, { email: admin.email, name: admin.name, passwordHash, now });
  });
  log(`setup: admin account created for ${admin.email}`);
  return 'created' as const;
}

export async function runSetup(
  db: Db,
  env: SetupEnv,
  { now, demoScenario, log }: { now: Date; demoScenario: () => unknown; log: (line: string) => void },
): Promise<SetupOutcome> {
  const seeded = env.seedDemo ? await seedDemo(db, demoScenario(), { now }) : null;
  if (!env.seedDemo) log('setup: SEED_DEMO=false, no demo network, windows or accounts');
  const admin = env.admin ? await ensureEnvAdmin(db, env.admin, now, log) : 'not-asked';
  let setUpToken: string | null = null;
  if (!env.seedDemo && !env.admin && (await countAdmins(db)) === 0) {
    setUpToken = await replaceUnusedLink(db, { kind: 'set-up', now, validSeconds: SET_UP_LINK_VALID_SECONDS });
    log(`setup: open ${env.publicUrl}/set-up?token=${setUpToken} to create the first admin (valid 24 h, once)`);
  }
  return { seeded, admin, setUpToken };
}
