// On a phone-sized Chromium the demo tenant user (Crannock Quay Logistics) opens Notices, reads the notice for
// planned work on its slices (moves, effect, times in its zone), downloads the invitation and acknowledges it.
// The notice is prepared through the API: the planner books a window taking down cell-yarrowmouth (it hosts only
// this tenant's slices), assesses it, runs a short plan, accepts it and submits it; the demo approver approves.
// The window starts 23 days ahead, beyond every demo tenant's lead time, so all notices go out and the window is
// notified. The sign-off policy is set to one approval without a code for the test and put back afterwards;
// the window is withdrawn at the end (which also sends the cancellations).
import type { APIRequestContext, Browser, BrowserContext } from 'playwright-core';
import path from 'node:path';
import { apiAs as apiAsUser, ok, prepareNotifiedWindow as prepareNotifiedWindowAs, setSignoffPolicies, slotAhead, withdrawWindow } from './helpers/api';
import { BASE_URL, SHOTS, launchBrowser, submitSignIn } from './helpers/browser';
import { eventually } from './helpers/eventually';

const PHONE = { width: 390, height: 844 };
const TENANT_ID = 't-crannock-logistics';
const SITE_ID = 'cell-yarrowmouth';
/** Clear of the windows (4 days) and sign-off (9 days) suites, and beyond the longest demo lead time (21 days). */
const DAYS_AHEAD = 23;

let browser: Browser;
const contexts: BrowserContext[] = [];

const apiAs = (email: string) => apiAsUser(browser, email, contexts);

/** Planned → in review → cleared (→ notified); returns the window id. */
async function prepareNotifiedWindow(): Promise<string> {
  return prepareNotifiedWindowAs(await apiAs('planner@demo.test'), await apiAs('approver@demo.test'), {
    title: `E2E notices ${Date.now().toString(36)}`, ...slotAhead(DAYS_AHEAD, 2), workType: 'hardware replacement',
    elements: [{ kind: 'site', id: SITE_ID, effect: 'down' }],
  });
}

let admin: APIRequestContext;
let savedPolicies: Record<string, unknown> | null = null;
let windowId: string | null = null;

beforeAll(async () => {
  browser = await launchBrowser();
  admin = await apiAs('admin@demo.test');
});
afterAll(async () => {
  if (savedPolicies) await admin.patch(`${BASE_URL}/api/policies`, { data: savedPolicies }).catch(() => undefined);
  if (windowId) await withdrawWindow(admin, windowId);
  for (const context of contexts) await context.close().catch(() => undefined);
  await browser?.close();
});

test('the tenant user reads the notice for work on its slices on a phone, downloads the invitation and acknowledges it', async () => {
  savedPolicies = await setSignoffPolicies(admin, { signoffQuorumLow: 1, signoffQuorumHigh: 1, signoffRequireCode: false });
  windowId = await prepareNotifiedWindow();
  const staffView = await ok(admin.get(`${BASE_URL}/api/windows/${windowId}/notices`), 'window notices');
  const own = staffView.notices.find((n: { tenantId: string }) => n.tenantId === TENANT_ID);
  expect(own).toBeTruthy();
  expect(own.status).not.toBe('blocked');

  const context = await browser.newContext({ viewport: PHONE });
  contexts.push(context);
  const page = await context.newPage();
  await submitSignIn(page, 'tenant@demo.test');
  await page.getByTestId('overview-sites').waitFor({ timeout: 30_000 });
  await page.getByTestId('nav-notices').click();
  await page.getByTestId(`notice-row-${own.id}`).waitFor({ timeout: 30_000 });
  await eventually(async () => expect(await page.getByTestId(`work-state-${windowId}`).innerText()).toBe('Please acknowledge'));
  await page.screenshot({ path: path.join(SHOTS, 'notices-list-phone.png'), fullPage: true });

  await page.getByTestId(`notice-row-${own.id}`).click();
  await page.getByTestId('notice-view-title').waitFor({ timeout: 30_000 });
  await eventually(async () => expect(await page.getByTestId('notice-view-title').innerText()).toBe('Planned network maintenance (hardware replacement)'));
  const slicesText = await page.getByTestId('notice-slices').innerText();
  expect(slicesText).not.toContain(SITE_ID);
  await eventually(async () => expect(await page.getByTestId('notice-when').innerText()).toMatch(/GMT-1[\s\S]*UTC/));

  // The download link serves the invitation for this tenant's UID.
  const ics = await context.request.get(`${BASE_URL}/api/notices/${own.id}/ics`);
  expect(ics.headers()['content-type']).toMatch(/^text\/calendar/);
  // RFC 5545 §3.1: long lines are folded (CRLF + one space); unfold before reading a property.
  const unfolded = (await ics.text()).replace(/\r\n[ \t]/g, '');
  expect(unfolded).toContain(`UID:${windowId}.${TENANT_ID}@slackwater.invalid`);
  await page.screenshot({ path: path.join(SHOTS, 'notices-detail-phone.png'), fullPage: true });

  await page.getByTestId('notice-acknowledge').click();
  await page.getByTestId('notice-acknowledged').waitFor({ timeout: 30_000 });
  await eventually(async () => expect(await page.getByTestId('notice-acknowledged').innerText()).toMatch(/^Acknowledged by Tess Marlow on /));
  await page.screenshot({ path: path.join(SHOTS, 'notices-acknowledged-phone.png'), fullPage: true });

  const after = await ok(admin.get(`${BASE_URL}/api/windows/${windowId}/notices`), 'window notices');
  expect(after.notices.find((n: { tenantId: string }) => n.tenantId === TENANT_ID).acknowledgedAt).not.toBeNull();
});
