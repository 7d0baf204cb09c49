// On a phone-sized Chromium: an engineer who works in Oslo time books a window on a demo site that hosts a critical
// slice's function, then a planner opens it, takes the next step (Assess impact), and sees the affected slices with
// the caution for the critical one. The engineer's zone is chosen for the test and put back afterwards.
import type { APIRequestContext, Browser, BrowserContext, Page } from 'playwright-core';
import { apiAs, ok } from './helpers/api';
import fs from 'node:fs';
import path from 'node:path';
import { BASE_URL, SHOTS, launchBrowser, submitSignIn } from './helpers/browser';
import { eventually } from './helpers/eventually';
const PHONE = { width: 390, height: 844 };
/** A zone away from UTC and from the network's, so the form's local-time conversion is exercised for real. */
const TIME_ZONE = 'Europe/Oslo';
const DAYS_AHEAD = 4;

type Demo = {
  sites: { id: string; name: string }[];
  slices: { id: string; name: string; critical?: boolean; functions: { id: string }[] }[];
  placements: { slice: string; sites: Record<string, string> }[];
};
const demo = JSON.parse(fs.readFileSync(path.resolve(__dirname, '../../scenarios/demo.json'), 'utf8')) as Demo;

/** The first critical slice (by id) with a placed function, and the site that hosts that function. */
function criticalTarget(): { sliceId: string; site: { id: string; name: string } } {
  const critical = demo.slices.filter((s) => s.critical).sort((a, b) => a.id.localeCompare(b.id));
  for (const slice of critical) {
    const placement = demo.placements.find((p) => p.slice === slice.id);
    const siteId = placement && slice.functions.map((f) => placement.sites[f.id]).find(Boolean);
    const site = siteId ? demo.sites.find((s) => s.id === siteId) : undefined;
    if (site) return { sliceId: slice.id, site };
  }
  throw new Error('scenarios/demo.json has no placed critical slice');
}

/** 'YYYY-MM-DD' of the day `days` ahead of now, as a clock in `timeZone` shows it. */
function dayAhead(days: number, timeZone: string): string {
  return new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' })
    .format(new Date(Date.now() + days * 86_400_000));
}

let browser: Browser;

beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  // Back to the network's zone for the suites that read the engineer's times.
  if (engineerRequest) await engineerRequest.patch(`${BASE_URL}/api/me/time-zone`, { data: { timeZone: null } }).catch(() => undefined);
  for (const context of apiContexts) await context.close().catch(() => undefined);
  await browser?.close();
});

let engineerRequest: APIRequestContext | null = null;
const apiContexts: BrowserContext[] = [];

async function signedInPage(email: string): Promise<Page> {
  const context = await browser.newContext({ viewport: PHONE, timezoneId: TIME_ZONE });
  const page = await context.newPage();
  await submitSignIn(page, email);
  await page.getByTestId('overview-sites').waitFor({ timeout: 30000 });
  return page;
}

async function bookWindow(page: Page, title: string, site: { id: string; name: string }): Promise<string> {
  await page.goto(`${BASE_URL}/windows/new`);
  await page.getByTestId('window-title').fill(title);
  const day = dayAhead(DAYS_AHEAD, TIME_ZONE);
  await page.getByTestId('window-start-date').fill(day);
  await page.getByTestId('window-start-time').fill('01:00');
  await page.getByTestId('window-end-date').fill(day);
  await page.getByTestId('window-end-time').fill('04:30');
  await page.getByTestId('window-work-type-power-work').click();
  await page.getByTestId('window-element-search').fill(site.name);
  await page.getByTestId(`window-element-option-${site.id}`).click();
  await page.getByTestId(`window-picked-${site.id}`).waitFor();
  await page.getByTestId('window-notes').fill('Rectifier swap; the site runs on batteries meanwhile.');
  await page.screenshot({ path: path.join(SHOTS, 'window-book-phone.png'), fullPage: true });
  await page.getByTestId('window-submit').click();
  await page.getByTestId('window-flash-booked').waitFor({ timeout: 30000 });
  const match = /\/windows\/([^/?#]+)/.exec(page.url());
  if (!match) throw new Error(`not on a window page after booking: ${page.url()}`);
  return decodeURIComponent(match[1]);
}

test('an engineer books a window on a critical site; a planner assesses it and sees the caution', async () => {
  const { sliceId, site } = criticalTarget();
  const title = `E2E rectifier swap ${Date.now().toString(36)}`;

  engineerRequest = await apiAs(browser, 'engineer@demo.test', apiContexts);
  await ok(engineerRequest.patch(`${BASE_URL}/api/me/time-zone`, { data: { timeZone: TIME_ZONE } }), 'engineer time zone');
  const engineer = await signedInPage('engineer@demo.test');
  const windowId = await bookWindow(engineer, title, site);
  await eventually(async () => expect(await engineer.getByTestId('window-title-heading').innerText()).toBe(title));
  await eventually(async () => expect(await engineer.getByTestId('window-when').innerText()).toMatch(/01:00 – 04:30 CES?T/));
  await eventually(async () => expect(await engineer.getByTestId('window-elements').innerText()).toContain(site.name));
  await engineer.screenshot({ path: path.join(SHOTS, 'window-detail-engineer-phone.png'), fullPage: true });
  await engineer.context().close();

  const planner = await signedInPage('planner@demo.test');
  await planner.goto(`${BASE_URL}/windows/${encodeURIComponent(windowId)}`);
  await eventually(async () => expect(await planner.getByTestId('window-status').innerText()).toContain('Draft'));
  await eventually(async () => expect(await planner.getByTestId('next-step-action').innerText()).toBe('Assess impact'));
  await planner.getByTestId('next-step-action').click();
  await planner.getByTestId('impact-affected').waitFor({ timeout: 60000 });
  await planner.getByTestId(`impact-slice-${sliceId}`).waitFor();
  const caution = planner.getByTestId('impact-critical-caution');
  await eventually(async () => expect(await caution.isVisible()).toBe(true));
  await eventually(async () => expect(await caution.innerText()).toMatch(/regulator/i));
  await eventually(async () => expect(await planner.getByTestId('impact-window-status').innerText()).toContain('Assessed'));
  await planner.screenshot({ path: path.join(SHOTS, 'window-impact-planner-phone.png'), fullPage: true });
  await planner.context().close();
});
