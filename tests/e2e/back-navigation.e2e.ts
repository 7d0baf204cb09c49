// On a phone-sized Chromium (390×844) every role goes from each of its lists to a detail and back again three
// ways: the detail's own back link, the area's tab, and the browser's back button. Each time the list must show
// again at its own address with no error screen (a navigator mounted and unmounted by address once crashed the
// app here with React error #185). The data the lists need is prepared through the API: a notified window (mail in
// the Outbox, a notice for the demo tenant) and a window waiting for sign-off (the approver's queue). The sign-off
// policy is set to one approval without a code for the test and put back afterwards; both windows are withdrawn.
import type { Page } from 'playwright-core';
import { prepareNotifiedWindow, prepareSubmittedWindow, slotAhead } from './helpers/api';
import { screenshotPath, submitSignIn } from './helpers/browser';
import { suiteUnderPolicies } from './helpers/suite';
import { eventually } from './helpers/eventually';

const PHONE = { width: 390, height: 844 };
/** Hosts only the demo tenant's (Crannock Quay Logistics) slices, so its notice reaches the demo tenant user. */
const SITE_ID = 'cell-yarrowmouth';
/** Clear of the other suites' days (4, 9, 23) and beyond the longest demo lead time (21 days). */
const NOTIFIED_DAYS_AHEAD = 25;
const IN_REVIEW_DAYS_AHEAD = 26;

type Way = 'link' | 'tab' | 'browser';
type Area = {
  key: string;
  /** The list's own address, and the tab that leads to it. */
  listPath: string;
  navKey: string;
  /** What shows while the list is open (a selector); a row of it that opens a detail; the detail's test id once open. */
  list: string;
  row: string;
  detail: string;
  /** Brings the row into view when the list alone does not (the calendar shows one day's windows). */
  reveal?: (page: Page) => Promise<void>;
  /** Whether the detail has a back link of its own on phones. */
  hasBackLink: boolean;
};

const SLICES: Area = { key: 'slices', listPath: '/slices', navKey: 'slices', list: '[data-testid="slices-table"]', row: '[data-testid^="slices-table-row-"]', detail: 'slice-detail-title', hasBackLink: true };
const NETWORK: Area = { key: 'network', listPath: '/network', navKey: 'network', list: '[data-testid="sites-table"]', row: '[data-testid^="sites-table-row-"]', detail: 'site-detail-title', hasBackLink: true };
const OUTBOX: Area = { key: 'outbox', listPath: '/outbox', navKey: 'outbox', list: '[data-testid="outbox-list"]', row: '[data-testid^="outbox-row-"]', detail: 'outbox-message-title', hasBackLink: true };
const NOTICES: Area = { key: 'notices', listPath: '/notices', navKey: 'notices', list: '[data-testid="notices-list"]', row: '[data-testid^="notice-row-"]', detail: 'notice-view-title', hasBackLink: true };
const CALENDAR: Area = {
  key: 'calendar', listPath: '/calendar', navKey: 'calendar', list: '[data-testid="calendar-month"]',
  row: '[data-testid^="agenda-window-"]:not([data-testid$="-when"])', detail: 'window-title-heading', hasBackLink: false,
  reveal: showNotifiedWindowDay,
};
const SIGN_OFF: Area = { key: 'sign-off', listPath: '/sign-off', navKey: 'sign-off', list: '[data-testid^="signoff-queue-item-"]', row: '[data-testid^="signoff-queue-item-"]', detail: 'signoff-title', hasBackLink: false };

const ROLES: { email: string; areas: Area[] }[] = [
  { email: 'engineer@demo.test', areas: [SLICES, NETWORK, CALENDAR] },
  { email: 'planner@demo.test', areas: [SLICES, NETWORK, CALENDAR] },
  { email: 'approver@demo.test', areas: [SLICES, NETWORK, SIGN_OFF] },
  { email: 'admin@demo.test', areas: [SLICES, NETWORK, OUTBOX, SIGN_OFF] },
  { email: 'tenant@demo.test', areas: [SLICES, NETWORK, NOTICES] },
];

const suite = suiteUnderPolicies({ signoffQuorumLow: 1, signoffQuorumHigh: 1, signoffRequireCode: false });

beforeAll(async () => {
  const planner = await suite.apiAs('planner@demo.test');
  const booking = (days: number) => ({
    title: `E2E back ${days} ${Date.now().toString(36)}`, ...slotAhead(days, 2), workType: 'hardware replacement',
    elements: [{ kind: 'site' as const, id: SITE_ID, effect: 'down' as const }],
  });
  suite.windowIds.push(await prepareNotifiedWindow(planner, await suite.apiAs('approver@demo.test'), booking(NOTIFIED_DAYS_AHEAD)));
  suite.windowIds.push(await prepareSubmittedWindow(planner, booking(IN_REVIEW_DAYS_AHEAD)));
});

/** On the calendar: the month, then the day of the notified window, whose agenda then lists it. */
async function showNotifiedWindowDay(page: Page) {
  const day = slotAhead(NOTIFIED_DAYS_AHEAD, 2).startsAt.slice(0, 10);
  await page.getByTestId('calendar-month-title').waitFor({ timeout: 30_000 });
  if (day.slice(0, 7) !== new Date().toISOString().slice(0, 7)) await page.getByTestId('calendar-next-month').click();
  await page.getByTestId(`calendar.day_${day}`).click();
}

/** The area's tab: in the bar itself, or behind More when the bar is full. */
async function tapTab(page: Page, navKey: string) {
  const inBar = page.getByTestId('bottom-tabs').getByTestId(`nav-${navKey}`);
  if (await inBar.count()) {
    await inBar.click();
    return;
  }
  await page.getByTestId('nav-more').click();
  await page.getByTestId('nav-more-sheet').getByTestId(`nav-${navKey}`).click();
}

async function expectNoCrash(page: Page) {
  const body = await page.locator('body').innerText();
  expect(body).not.toContain('Something went wrong');
  expect(body).not.toMatch(/React error/);
}

async function openDetail(page: Page, area: Area) {
  await page.locator(area.list).first().waitFor({ timeout: 30_000 });
  if (area.reveal) await area.reveal(page);
  const row = page.locator(area.row).first();
  await row.waitFor({ timeout: 30_000 });
  await row.click();
  await page.getByTestId(area.detail).waitFor({ timeout: 30_000 });
  expect(new URL(page.url()).pathname).not.toBe(area.listPath);
}

async function goBack(page: Page, area: Area, way: Way) {
  if (way === 'link') await page.getByTestId('detail-back').filter({ visible: true }).click();
  else if (way === 'tab') await tapTab(page, area.navKey);
  else await page.goBack();
  await eventually(async () => {
    expect(new URL(page.url()).pathname).toBe(area.listPath);
    await expectNoCrash(page);
    expect(await page.locator(area.list).first().isVisible()).toBe(true);
    expect(await page.getByTestId(area.detail).isVisible()).toBe(false);
  });
}

describe.each(ROLES)('back from a detail on a phone, as $email', ({ email, areas }) => {
  test(`list → detail → back by link, tab and browser in ${areas.map((a) => a.key).join(', ')}`, async () => {
    const context = await suite.browser.newContext({ viewport: PHONE });
    suite.contexts.push(context);
    const page = await context.newPage();
    const pageErrors: string[] = [];
    page.on('pageerror', (error) => pageErrors.push(error.message));
    await submitSignIn(page, email);
    await page.getByTestId('bottom-tabs').waitFor({ timeout: 30_000 });

    for (const area of areas) {
      await tapTab(page, area.navKey);
      const ways: Way[] = area.hasBackLink ? ['link', 'tab', 'browser'] : ['tab', 'browser'];
      for (const way of ways) {
        await openDetail(page, area);
        await goBack(page, area, way);
      }
    }
    await page.screenshot({ path: screenshotPath(`back-navigation-${email.split('@')[0]}-phone.png`), fullPage: true });
    expect(pageErrors).toEqual([]);
  });
});
