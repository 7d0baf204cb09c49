// On a wide Chromium (1280×800) a planner does the everyday jobs with the keyboard alone (page.keyboard only once
// signed in; an address may be loaded, nothing is clicked): skips the navigation with the skip link, books a
// window, opens it from the calendar, opens a slice from the slices table and reaches a site from the map. Each step
// asserts where focus lands, so a control that a keyboard cannot reach or operate fails here. The booked window is
// withdrawn afterwards.
import type { APIRequestContext, Browser, BrowserContext, Page } from 'playwright-core';
import { apiAs as apiAsUser, ok, withdrawWindow } from './helpers/api';
import { BASE_URL, launchBrowser, submitSignIn } from './helpers/browser';
import { eventually } from './helpers/eventually';

const WIDE = { width: 1280, height: 800 };
const SITE_ID = 'cell-yarrowmouth';
/** Clear of the other suites' days (4, 9, 23–34); a short way ahead so the calendar needs few arrow presses. */
const DAYS_AHEAD = 2;
/** Most Tab presses allowed from a page's load to its main content, the skip link's Enter included in none. */
const MAX_TABS_TO_CONTENT = 3;

let browser: Browser;
const contexts: BrowserContext[] = [];
let admin: APIRequestContext;
let page: Page;
let bookedId: string | null = null;

beforeAll(async () => {
  browser = await launchBrowser();
  admin = await apiAsUser(browser, 'admin@demo.test', contexts);
  const context = await browser.newContext({ viewport: WIDE });
  contexts.push(context);
  page = await context.newPage();
  await submitSignIn(page, 'planner@demo.test');
  await page.getByTestId('overview-sites').waitFor({ timeout: 30_000 });
});

afterAll(async () => {
  if (bookedId) await withdrawWindow(admin, bookedId);
  for (const context of contexts) await context.close().catch(() => undefined);
  await browser?.close();
});

/** The test id of the focused element or its nearest ancestor with one ('' when focus is on the page itself). */
async function focusedTestId(): Promise<string> {
  return page.evaluate(() => {
    const active = document.activeElement;
    return active?.closest('[data-testid]')?.getAttribute('data-testid') ?? '';
  });
}

/** Presses Tab (Shift+Tab with `backwards`) until the focused element's test id matches; returns the presses. */
async function tabTo(match: string | RegExp, maxPresses = 80, backwards = false): Promise<number> {
  for (let presses = 1; presses <= maxPresses; presses += 1) {
    await page.keyboard.press(backwards ? 'Shift+Tab' : 'Tab');
    const focused = await focusedTestId();
    if (typeof match === 'string' ? focused === match : match.test(focused)) return presses;
  }
  throw new Error(`${String(match)} not reached with ${maxPresses} Tab presses (focus on "${await focusedTestId()}")`);
}

/** Loads an address afresh and waits for its content, so the Tab walk starts at the top of the page. */
async function load(address: string, ready: string) {
  await page.goto(`${BASE_URL}${address}`);
  await page.getByTestId(ready).first().waitFor({ timeout: 30_000 });
}

/** 'YYYY-MM-DD' `days` ahead as the viewer's clock shows it (the planner's zone, which the form and calendar use). */
async function dayAhead(days: number): Promise<string> {
  const me = await ok(page.context().request.get(`${BASE_URL}/api/me`), 'me');
  return new Intl.DateTimeFormat('en-CA', { timeZone: me.timeZone, year: 'numeric', month: '2-digit', day: '2-digit' })
    .format(new Date(Date.now() + days * 86_400_000));
}

test(`the skip link reaches the main content within ${MAX_TABS_TO_CONTENT} Tab presses of loading a page`, async () => {
  await load('/slices', 'slices-table');
  const presses = await tabTo('skip-link', MAX_TABS_TO_CONTENT);
  expect(presses).toBeLessThanOrEqual(MAX_TABS_TO_CONTENT);
  await page.keyboard.press('Enter');
  await eventually(async () => expect(await focusedTestId()).toBe('main-content'));
  // The next Tab goes on inside the content, not back to the navigation.
  await page.keyboard.press('Tab');
  expect(await page.evaluate(() => Boolean(document.activeElement?.closest('[data-testid="main-content"]')))).toBe(true);
});

test('a window is booked, then opened from the calendar, by keyboard alone', async () => {
  const site = await ok(page.context().request.get(`${BASE_URL}/api/sites/${SITE_ID}`), 'site');
  const siteName: string = site.site?.name ?? site.name;
  const day = await dayAhead(DAYS_AHEAD);
  const title = `E2E keyboard ${Date.now().toString(36)}`;

  await load('/windows/new', 'window-title');
  await tabTo('window-title');
  await page.keyboard.type(title);
  for (const [field, text] of [['window-start-date', day], ['window-start-time', '01:00'], ['window-end-date', day], ['window-end-time', '03:00']]) {
    await tabTo(field);
    await page.keyboard.press('ControlOrMeta+A');
    await page.keyboard.type(text);
  }
  // The work types are one radio group: one Tab stop, arrows move the choice.
  await tabTo(/^window-work-type-/);
  for (let presses = 0; presses < 12 && (await focusedTestId()) !== 'window-work-type-power-work'; presses += 1) {
    await page.keyboard.press('ArrowRight');
  }
  expect(await focusedTestId()).toBe('window-work-type-power-work');
  await page.keyboard.press('Space');
  expect(await page.getByTestId('window-work-type-power-work').getAttribute('aria-checked')).toBe('true');

  await tabTo('window-element-search');
  await page.keyboard.type(siteName);
  await tabTo(`window-element-option-${SITE_ID}`);
  await page.keyboard.press('Enter');
  await page.getByTestId(`window-picked-${SITE_ID}`).waitFor({ timeout: 10_000 });
  await tabTo('window-submit');
  await page.keyboard.press('Enter');
  await page.getByTestId('window-flash-booked').waitFor({ timeout: 30_000 });
  const match = /\/windows\/([^/?#]+)/.exec(page.url());
  expect(match).not.toBeNull();
  bookedId = decodeURIComponent(match![1]);

  // The calendar: into the month grid, arrows to the window's day (across into the next month when needed), Enter
  // picks the day, then Tab to its row in the day's list and Enter opens the window.
  await load('/calendar', 'calendar-month-title');
  await tabTo(/^calendar\.day_/);
  const from = (await focusedTestId()).slice('calendar.day_'.length);
  const steps = Math.round((Date.parse(`${day}T00:00:00Z`) - Date.parse(`${from}T00:00:00Z`)) / 86_400_000);
  for (let i = 0; i < Math.abs(steps); i += 1) await page.keyboard.press(steps > 0 ? 'ArrowRight' : 'ArrowLeft');
  await eventually(async () => expect(await focusedTestId()).toBe(`calendar.day_${day}`), 5_000);
  await page.keyboard.press('Enter');
  await tabTo(`agenda-window-${bookedId}`);
  await page.keyboard.press('Enter');
  await eventually(async () => expect(await page.getByTestId('window-title-heading').innerText()).toBe(title));
  expect(new URL(page.url()).pathname).toBe(`/windows/${bookedId}`);
});

test('a slice opens from the slices table by keyboard alone', async () => {
  await load('/slices', 'slices-table');
  await tabTo(/^slices-table-open-/);
  const row = await focusedTestId();
  await page.keyboard.press('Enter');
  await page.getByTestId('slice-detail-title').waitFor({ timeout: 30_000 });
  expect(new URL(page.url()).pathname).toBe(`/slices/${row.replace(/^slices-table-open-/, '')}`);
});

test('a site is reached from the map by keyboard alone', async () => {
  await load('/map', 'network-map');
  // The map's keyboard way in: its list of sites and spans (opened when folded), each choosing the element.
  const reached = await tabTo(new RegExp(`^(map-list-toggle|map-list-site-${SITE_ID})$`), 200);
  expect(reached).toBeGreaterThan(0);
  if ((await focusedTestId()) === 'map-list-toggle') {
    if ((await page.getByTestId('map-list-toggle').getAttribute('aria-expanded')) === 'false') await page.keyboard.press('Enter');
    await tabTo(`map-list-site-${SITE_ID}`, 200);
  }
  await page.keyboard.press('Enter');
  await page.getByTestId('map-selection').waitFor({ timeout: 10_000 });
  // The chosen element's panel sits above the list: back up to its open action.
  if ((await focusedTestId()) !== 'map-selection-open') await tabTo('map-selection-open', 200, true);
  await page.keyboard.press('Enter');
  await page.getByTestId('site-detail-title').waitFor({ timeout: 30_000 });
  expect(new URL(page.url()).pathname).toBe(`/network/sites/${SITE_ID}`);
});
