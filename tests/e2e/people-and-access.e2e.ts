// People and access in Chromium: an admin invites a planner, the invitation mail reaches the mail sink, the planner
// follows its link, sets a password and signs in; a staff member signs in through an OpenID Connect issuer (the
// local stand-in, started by this suite on a free port); an admin filters the audit trail by a window and downloads
// it as CSV. Addresses and titles carry a per-run suffix, so the suite can run twice against the same database.
import type { APIRequestContext, Browser, BrowserContext, Download, Page } from 'playwright-core';
import fs from 'node:fs';
import path from 'node:path';
import { apiAs, ok, slotAhead, withdrawWindow } from './helpers/api';
import { BASE_URL, SHOTS, launchBrowser, submitSignIn } from './helpers/browser';
import { eventually } from './helpers/eventually';
import { startLocalIssuer, TEST_CLIENT_ID, TEST_CLIENT_SECRET, type LocalIssuer } from '../server/sso/local-issuer';
import { DEMO_GROUP_ROLES, DEMO_SSO_CLIENT_SECRET } from '../../db/seed/seed-sso';

const RUN = `${Date.now().toString(36)}${Math.floor(Math.random() * 1296).toString(36)}`;
const PASSPHRASE = 'tidal-ledger-copper-lantern-83';

let browser: Browser;
const contexts: BrowserContext[] = [];
let admin: APIRequestContext;

beforeAll(async () => {
  browser = await launchBrowser();
  admin = await apiAs(browser, 'admin@demo.test', contexts);
});
afterAll(async () => {
  for (const c of contexts) await c.close().catch(() => undefined);
  await browser?.close();
});

async function newPage(viewport = { width: 1280, height: 800 }): Promise<Page> {
  const context = await browser.newContext({ viewport });
  contexts.push(context);
  return context.newPage();
}

async function signInInBrowser(page: Page, email: string): Promise<void> {
  await submitSignIn(page, email);
  await page.getByTestId('overview-slices').waitFor({ timeout: 30000 });
}

type OutboxItem = { id: number; to: string[]; subject: string | null };

test('an admin invites a planner; the mail arrives; the planner follows the link, sets a password and signs in', async () => {
  const email = `new.planner.${RUN}@operator.test`;
  const page = await newPage({ width: 390, height: 844 });
  await signInInBrowser(page, 'admin@demo.test');
  await page.goto(`${BASE_URL}/people`);
  await page.getByTestId('people-invite-open').click();
  await page.getByTestId('people-invite-email').fill(email);
  await page.getByTestId('people-invite-name').fill(`Noor Vance ${RUN}`);
  await page.getByTestId('people-invite-roles-planner').click();
  await page.getByTestId('people-invite-submit').click();
  await page.getByTestId('people-invite-done').waitFor({ timeout: 30000 });
  await page.screenshot({ path: path.join(SHOTS, 'people-invited-phone.png'), fullPage: true });

  // The mail worker sends through the local sink; the Outbox lists what the sink received.
  let mail: OutboxItem | undefined;
  await eventually(async () => {
    const list = await ok(admin.get(`${BASE_URL}/api/outbox?pageSize=50`), 'outbox') as { items: OutboxItem[] };
    mail = list.items.find((m) => m.to.some((to) => to.includes(email)));
    expect(mail).toBeDefined();
  }, 60_000);
  const message = JSON.stringify(await ok(admin.get(`${BASE_URL}/api/outbox/${mail!.id}`), 'outbox message'));
  const link = /https?:\/\/[^\s"\\]+\/invitation\?token=[A-Za-z0-9_%-]+/.exec(message)?.[0];
  expect(link).toBeDefined();

  const invitee = await newPage({ width: 390, height: 844 });
  await invitee.goto(link!.replace(/^https?:\/\/[^/]+/, BASE_URL));
  // A staff invitee may take the company's sign-on instead of a password (the demo has it set up).
  await invitee.getByTestId('invitation-sso-slot').getByTestId('sso-sign-in').waitFor({ timeout: 30000 });
  await invitee.getByTestId('invitation-password').fill(PASSPHRASE);
  await invitee.getByTestId('invitation-password-again').fill(PASSPHRASE);
  await invitee.getByTestId('invitation-submit').click();
  await invitee.getByTestId('overview-slices').waitFor({ timeout: 30000 });
  const me = await (await invitee.request.get(`${BASE_URL}/api/me`)).json();
  expect([me.email, me.roles]).toEqual([email, ['planner']]);

  // The link is spent, and the new password signs in from a fresh browser.
  const again = await invitee.request.get(`${BASE_URL}/api/invitations/link/${new URL(link!).searchParams.get('token')}`);
  expect(again.status()).toBe(404);
  const fresh = await newPage();
  await submitSignIn(fresh, email, PASSPHRASE);
  await fresh.getByTestId('overview-slices').waitFor({ timeout: 30000 });
});

describe('single sign-on through the local issuer', () => {
  let issuer: LocalIssuer;
  let saved: Record<string, unknown>;
  const login = `mira${RUN}`;
  const email = `mira.${RUN}@harbourline.test`;

  beforeAll(async () => {
    issuer = await startLocalIssuer(`${BASE_URL}/api/auth/sso/callback`, [
      { login, name: `Mira Castell ${RUN}`, email, groups: ['network-planning'] },
    ]);
    saved = await ok(admin.get(`${BASE_URL}/api/sso`), 'sso settings');
    await ok(admin.put(`${BASE_URL}/api/sso`, { data: {
      enabled: true, issuerUrl: issuer.url, clientId: TEST_CLIENT_ID, clientSecret: TEST_CLIENT_SECRET,
      displayName: 'Harbourline staff login', groupsClaim: 'groups', groupRoles: DEMO_GROUP_ROLES, passwordSignInForStaff: true,
    } }), 'sso settings for the test issuer');
  }, 60_000);
  afterAll(async () => {
    // Back to the demo's own settings (the secret is never read back: the demo's is a published constant).
    if (saved) {
      const { enabled, issuerUrl, clientId, displayName, groupsClaim, groupRoles, passwordSignInForStaff } = saved;
      await admin.put(`${BASE_URL}/api/sso`, { data: {
        enabled, issuerUrl, clientId, clientSecret: DEMO_SSO_CLIENT_SECRET, displayName, groupsClaim, groupRoles, passwordSignInForStaff,
      } }).catch(() => undefined);
    }
    await issuer?.stop();
  });

  test('a staff member signs in with the button, through the issuer\'s own page, with the role its group gives', async () => {
    const page = await newPage();
    await page.goto(`${BASE_URL}/sign-in`);
    const button = page.getByTestId('sso-sign-in');
    await eventually(async () => expect(await button.innerText()).toContain('Sign in with Harbourline staff login'));
    await button.click();
    await page.locator('input[name="login"]').fill(login);
    await page.locator('input[name="password"]').fill('any password: the stand-in issuer accepts it');
    await page.locator('button[type="submit"]').click();
    await page.getByTestId('overview-slices').waitFor({ timeout: 30000 });
    const me = await (await page.request.get(`${BASE_URL}/api/me`)).json();
    expect([me.email, me.roles]).toEqual([email, ['planner']]);
    await page.screenshot({ path: path.join(SHOTS, 'sso-signed-in-wide.png') });
  });
});

test('an admin filters the audit trail by a window and downloads those rows as CSV', async () => {
  const engineer = await apiAs(browser, 'engineer@demo.test', contexts);
  const title = `Audit trail check ${RUN}`;
  const booked = await ok(engineer.post(`${BASE_URL}/api/windows`, { data: {
    title, workType: 'hardware replacement', ...slotAhead(83, 1), elements: [{ kind: 'site', id: 'cell-yarrowmouth', effect: 'down' }],
  } }), 'book');
  const windowId = booked.window.id as string;
  try {
    const page = await newPage();
    await signInInBrowser(page, 'admin@demo.test');
    await page.goto(`${BASE_URL}/audit`);
    await page.getByTestId('audit-filter-window').click();
    await page.getByTestId(`audit-filter-window-option-${windowId}`).click();
    await eventually(async () => {
      const subjects = await page.getByTestId('audit-row-subject').allInnerTexts();
      expect(subjects.length).toBeGreaterThan(0);
      for (const s of subjects) expect(s).toContain(title);
    });
    await page.screenshot({ path: path.join(SHOTS, 'audit-by-window-wide.png'), fullPage: true });

    // The download opens the CSV address; it may start from this page or from the tab the browser opens for it.
    const download = new Promise<Download>((resolve) => {
      page.on('download', resolve);
      page.context().on('page', (tab) => tab.on('download', resolve));
    });
    await page.getByTestId('audit-download-csv').click();
    const file = await (await download).path();
    const csv = fs.readFileSync(file!, 'utf8').replace(/^\uFEFF/, '');
    expect(csv.split(/\r?\n/)[0]).toMatch(/when/i);
    expect(csv).toContain(title);
  } finally {
    await withdrawWindow(engineer, windowId);
  }
});
