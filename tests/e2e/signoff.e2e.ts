// On a phone-sized Chromium the demo approver sets up one-time codes (QR code and key on screen), opens the sign-off
// queue from its tab, reads the one-screen summary and approves with a one-time code; the window is cleared.
// The window is prepared through the API as the demo planner (book on a site hosting a critical slice, assess,
// run a plan, accept, submit). The demo has one approver, so the admin sets both quorums to 1 for the test and
// turns codes on; everything is put back afterwards (policies, the approver's key, the window is withdrawn).
import type { APIRequestContext, Browser, BrowserContext, Page } from 'playwright-core';
import { createHmac } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import { apiAs as apiAsUser, ok, prepareSubmittedWindow, setSignoffPolicies, slotAhead, withdrawWindow } from './helpers/api';
import { BASE_URL, SHOTS, launchBrowser, submitSignIn } from './helpers/browser';
import { eventually } from './helpers/eventually';

const PHONE = { width: 390, height: 844 };
const APPROVER_ID = 'user-demo-approver';
/** Clear of the windows suite (4 days ahead) and of the demo windows' own dates. */
const DAYS_AHEAD = 9;

type Demo = { slices: { id: string; critical?: boolean; functions: { id: string }[] }[]; placements: { slice: string; sites: Record<string, string> }[] };
const demo = JSON.parse(fs.readFileSync(path.resolve(__dirname, '../../scenarios/demo.json'), 'utf8')) as Demo;

/** A site hosting a function of the last critical slice (by id), so the summary shows the caution. */
function criticalSite(): string {
  const critical = demo.slices.filter((s) => s.critical).sort((a, b) => b.id.localeCompare(a.id));
  for (const slice of critical) {
    const placement = demo.placements.find((p) => p.slice === slice.id);
    const site = placement && slice.functions.map((f) => placement.sites[f.id]).find(Boolean);
    if (site) return site;
  }
  throw new Error('scenarios/demo.json has no placed critical slice');
}

/**
 * RFC 4226 HOTP with HMAC-SHA-1 and dynamic truncation, over the RFC 6238 time step (30 s, 6 digits): written here
 * with node:crypto on purpose, so the server's codes are checked against an implementation of our own.
 */
function totp(keyBase32: string, at: number): string {
  const alphabet = 'ABCDEFGHIJKLMNOPQRSTUVWXYZ234567';
  let bits = '';
  for (const ch of keyBase32.replace(/=+$/, '')) bits += alphabet.indexOf(ch).toString(2).padStart(5, '0');
  const key = Buffer.from(bits.match(/.{8}/g)!.map((b) => parseInt(b, 2)));
  const counter = Buffer.alloc(8);
  counter.writeBigUInt64BE(BigInt(Math.floor(at / 1000 / 30)));
  const mac = createHmac('sha1', key).update(counter).digest();
  const offset = mac[mac.length - 1] & 0x0f;
  return String((mac.readUInt32BE(offset) & 0x7fffffff) % 1_000_000).padStart(6, '0');
}

let browser: Browser;
const contexts: BrowserContext[] = [];

const apiAs = (email: string) => apiAsUser(browser, email, contexts);

/** Book, assess, plan, accept and submit a window as the planner; returns its id. */
async function prepareWindow(planner: APIRequestContext): Promise<string> {
  return prepareSubmittedWindow(planner, {
    title: `E2E sign-off ${Date.now().toString(36)}`, ...slotAhead(DAYS_AHEAD, 1), workType: 'power work',
    elements: [{ kind: 'site', id: criticalSite(), effect: 'down' }],
  });
}

async function enrol(page: Page): Promise<string> {
  await page.goto(`${BASE_URL}/security`);
  await page.getByTestId('otp-start').click();
  await page.getByTestId('otp-qr').locator('svg').first().waitFor({ timeout: 30_000 });
  const key = (await page.getByTestId('otp-key').innerText()).replace(/\s+/g, '');
  await page.screenshot({ path: path.join(SHOTS, 'signoff-enrol-phone.png'), fullPage: true });
  await page.getByTestId('otp-confirm-code').fill(totp(key, Date.now()));
  await page.getByTestId('otp-confirm-submit').click();
  await page.getByTestId('otp-enrolled').waitFor({ timeout: 30_000 });
  return key;
}

let admin: APIRequestContext;
let savedPolicies: Record<string, unknown> | null = null;
let windowId: string | null = null;

beforeAll(async () => {
  browser = await launchBrowser();
  admin = await apiAs('admin@demo.test');
  await ok(admin.delete(`${BASE_URL}/api/signoff/otp-keys/${APPROVER_ID}`), 'reset key');
});
afterAll(async () => {
  if (savedPolicies) await admin.patch(`${BASE_URL}/api/policies`, { data: savedPolicies }).catch(() => undefined);
  await admin?.delete(`${BASE_URL}/api/signoff/otp-keys/${APPROVER_ID}`).catch(() => undefined);
  if (windowId) await withdrawWindow(await apiAs('planner@demo.test'), windowId);
  for (const context of contexts) await context.close().catch(() => undefined);
  await browser?.close();
});

test('an approver enrols for one-time codes, opens the queue on a phone and approves with a code', async () => {
  windowId = await prepareWindow(await apiAs('planner@demo.test'));
  savedPolicies = await setSignoffPolicies(admin, { signoffQuorumLow: 1, signoffQuorumHigh: 1, signoffRequireCode: true });

  const context = await browser.newContext({ viewport: PHONE });
  contexts.push(context);
  const page = await context.newPage();
  await submitSignIn(page, 'approver@demo.test');
  await page.getByTestId('overview-sites').waitFor({ timeout: 30_000 });
  const key = await enrol(page);

  await page.goto(BASE_URL);
  // Sign-off has a place of its own in an approver's phone tab bar.
  await page.getByTestId('nav-sign-off').click();
  await page.getByTestId(`signoff-queue-item-${windowId}`).click();
  await page.getByTestId('signoff-title').waitFor({ timeout: 30_000 });
  await eventually(async () => expect(await page.getByTestId('signoff-critical-caution').isVisible()).toBe(true));
  await eventually(async () => expect(await page.getByTestId('signoff-moves-lead').innerText()).toMatch(/\d+ touched slices? of \d+ tenants?: \d+ move/));
  await page.screenshot({ path: path.join(SHOTS, 'signoff-summary-phone.png'), fullPage: true });

  await page.getByTestId('signoff-comment').fill('Checked the moves and the MOP; agreed with the service operations team.');
  // The enrolment spent this step's code; the next step's code is within the accepted drift and not a replay.
  await page.getByTestId('signoff-code').fill(totp(key, Date.now() + 30_000));
  await page.getByTestId('signoff-approve').click();
  await page.getByTestId(`signoff-decision-1-${APPROVER_ID}`).waitFor({ timeout: 30_000 });
  await eventually(async () => expect(await page.getByTestId(`signoff-decision-1-${APPROVER_ID}`).innerText()).toContain('confirmed with a code'));
  await eventually(async () => expect(await page.getByTestId('signoff-blocked').innerText()).toContain('You have decided'));
  await eventually(async () => expect(await page.getByTestId('signoff-status').innerText()).toMatch(/Cleared|Notified/));
  await page.screenshot({ path: path.join(SHOTS, 'signoff-approved-phone.png'), fullPage: true });

  const w = await ok(admin.get(`${BASE_URL}/api/windows/${windowId}`), 'window');
  expect(['cleared', 'notified']).toContain(w.status);
});
