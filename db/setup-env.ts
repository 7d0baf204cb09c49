// What `db/setup.ts` reads from the environment: whether to seed the demo, and the first admin's account.
import { newAdminSchema, type NewAdmin } from '../shared/setup';

export class SetupEnvError extends Error {}

export interface SetupEnv {
  /** SEED_DEMO: default true (the demo network, windows and accounts) */
  seedDemo: boolean;
  /** ADMIN_EMAIL + ADMIN_PASSWORD (+ ADMIN_NAME): the admin to create when no account has that e-mail */
  admin: NewAdmin | null;
  /** where the printed set-up link points */
  publicUrl: string;
}

const TRUE_WORDS = new Set(['true', '1', 'yes']);
const FALSE_WORDS = new Set(['false', '0', 'no']);

const set = (value: string | undefined) => (value !== undefined && value.trim() !== '' ? value : undefined);

function parseSeedDemo(raw: string | undefined): boolean {
  const value = set(raw)?.trim().toLowerCase();
  if (value === undefined || TRUE_WORDS.has(value)) return true;
  if (FALSE_WORDS.has(value)) return false;
  throw new SetupEnvError(`SEED_DEMO is "${raw}"; use true (seed the demo, the default) or false (start empty).`);
}

/** The password policy's judge (server/auth/password-policy.ts, passed in by db/setup.ts): problems, or none. */
export type PasswordJudge = (password: string, person: { email: string; name: string }) => string[];

function parseAdmin(env: Record<string, string | undefined>, judgePassword?: PasswordJudge): NewAdmin | null {
  const email = set(env.ADMIN_EMAIL)?.trim();
  const password = set(env.ADMIN_PASSWORD);
  if (email === undefined && password === undefined) return null;
  if (email === undefined || password === undefined) {
    const missing = email === undefined ? 'ADMIN_EMAIL' : 'ADMIN_PASSWORD';
    throw new SetupEnvError(`${missing} is not set: set both ADMIN_EMAIL and ADMIN_PASSWORD to create the first admin, or neither.`);
  }
  const name = set(env.ADMIN_NAME)?.trim() ?? email.split('@')[0];
  const parsed = newAdminSchema.safeParse({ name, email, password });
  if (parsed.success) {
    const problems = judgePassword?.(parsed.data.password, parsed.data) ?? [];
    if (problems.length > 0) throw new SetupEnvError(`ADMIN_PASSWORD: ${problems.join(' ')}`);
    return parsed.data;
  }
  const variable = { name: 'ADMIN_NAME', email: 'ADMIN_EMAIL', password: 'ADMIN_PASSWORD' } as const;
  const lines = parsed.error.issues.map((issue) => {
    const field = issue.path[0] as keyof typeof variable;
    return `${variable[field] ?? String(field)}: ${issue.message}`;
  });
  throw new SetupEnvError(lines.join('; '));
}

/** Parses `env`; throws SetupEnvError with a message that names the variable to fix. */
export function parseSetupEnv(env: Record<string, string | undefined>, { judgePassword }: { judgePassword?: PasswordJudge } = {}): SetupEnv {
  const port = set(env.PORT) ?? '8080';
  return {
    seedDemo: parseSeedDemo(env.SEED_DEMO),
    admin: parseAdmin(env, judgePassword),
    publicUrl: (set(env.PUBLIC_URL) ?? `http://127.0.0.1:${port}`).replace(/\/$/, ''),
  };
}
