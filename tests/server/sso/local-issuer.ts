// The local OpenID Connect issuer (scripts/oidc-issuer.ts) for SSO tests: started on a free loopback port with a
// people list the test can rewrite, and a scripted walk through its login page that returns the callback address.
// oidc-provider ships only ES modules, which jest's CommonJS runtime cannot load, so it runs beside the test.
import { spawn, type ChildProcess } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { DevIdentity } from '../../../scripts/oidc-identities';

export const TEST_CLIENT_ID = 'slackwater-test';
export const TEST_CLIENT_SECRET = 'test-client-secret-for-the-local-issuer';

export type LocalIssuer = {
  url: string;
  /** replaces the issuer's people (read again at each sign-in) */
  setPeople(people: DevIdentity[]): void;
  stop(): Promise<void>;
};

const ROOT = path.join(__dirname, '../../..');

export async function startLocalIssuer(redirectUri: string, people: DevIdentity[]): Promise<LocalIssuer> {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'sso-issuer-'));
  const file = path.join(dir, 'people.json');
  const setPeople = (list: DevIdentity[]) => fs.writeFileSync(file, JSON.stringify(list));
  setPeople(people);
  const child: ChildProcess = spawn(path.join(ROOT, 'node_modules/.bin/tsx'), ['scripts/oidc-issuer.ts'], {
    cwd: ROOT,
    env: { ...process.env, OIDC_ISSUER_PORT: '0', OIDC_IDENTITIES_FILE: file, OIDC_REDIRECT_URIS: redirectUri,
      OIDC_CLIENT_ID: TEST_CLIENT_ID, OIDC_CLIENT_SECRET: TEST_CLIENT_SECRET },
    stdio: ['ignore', 'pipe', process.env.SSO_ISSUER_LOG ? 'inherit' : 'pipe'],
  });
  const url = await new Promise<string>((resolve, reject) => {
    let out = '';
    let err = '';
    child.stdout!.on('data', (chunk: Buffer) => {
      out += chunk.toString();
      const m = /listening on (http:\/\/127\.0\.0\.1:\d+)/.exec(out);
      if (m) resolve(m[1]);
    });
    child.stderr?.on('data', (chunk: Buffer) => { err += chunk.toString(); });
    child.on('exit', (code) => reject(new Error(`local issuer exited (${code}): ${err}`)));
  });
  const stop = () => new Promise<void>((resolve) => {
    if (child.exitCode !== null) return resolve();
    child.once('exit', () => resolve());
    child.kill('SIGTERM');
  }).then(() => fs.rmSync(dir, { recursive: true, force: true }));
  return { url, setPeople, stop };
}

/** A minimal cookie jar: name=value pairs sent to every path of the issuer (enough for its own cookies). */
class Jar {
  private cookies = new Map<string, string>();
  take(res: Response): void {
    for (const line of res.headers.getSetCookie()) {
      const [pair] = line.split(';');
      const eq = pair.indexOf('=');
      this.cookies.set(pair.slice(0, eq), pair.slice(eq + 1));
    }
  }
  header(): string {
    return [...this.cookies].map(([k, v]) => `${k}=${v}`).join('; ');
  }
}

/**
 * Follows the issuer's redirects from the authorization address, signs in on its login page as `login`, and
 * returns the redirect back to Slackwater (its path and query, ready for supertest).
 */
export async function signInAtIssuer(authorizationUrl: string, login: string): Promise<string> {
  const jar = new Jar();
  let next = new URL(authorizationUrl);
  for (let hop = 0; hop < 10; hop += 1) {
    const interaction = /^\/interaction\/([^/]+)$/.exec(next.pathname);
    const res = interaction
      ? await fetch(new URL(`/interaction/${interaction[1]}`, next), {
        method: 'POST', redirect: 'manual',
        headers: { cookie: jar.header(), 'content-type': 'application/x-www-form-urlencoded' },
        body: new URLSearchParams({ prompt: 'login', login, password: 'any password' }).toString(),
      })
      : await fetch(next, { redirect: 'manual', headers: { cookie: jar.header() } });
    jar.take(res);
    const location = res.headers.get('location');
    if (!location) throw new Error(`the issuer stopped at ${next.pathname} with ${res.status}: ${(await res.text()).slice(0, 300)}`);
    const target = new URL(location, next);
    if (target.pathname === '/api/auth/sso/callback') return `${target.pathname}${target.search}`;
    next = target;
  }
  throw new Error('too many redirects at the issuer');
}
