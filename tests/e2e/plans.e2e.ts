// On a phone-sized Chromium a planner takes demo window w-12 (battery work that takes an edge site down, so its
// slices must move) from assessed to planned: runs the re-mapper with a short time limit, watches the progress bar
// advance, sees the diff and the map appear without reloading, accepts, and finds the window planned.
// w-12 is used by no other end-to-end suite (windows.e2e.ts books its own window).
import type { Browser, Page } from 'playwright-core';
import path from 'node:path';
import { BASE_URL, SHOTS, launchBrowser, submitSignIn } from './helpers/browser';
import { eventually } from './helpers/eventually';

const PHONE = { width: 390, height: 844 };
const WINDOW_ID = 'w-12';
/** Long enough to see the bar move at one poll a second, short enough for the suite. */
const TIME_LIMIT_SECONDS = 6;
/** The queue, the search and the greedy and exact references after it. */
const RESULT_TIMEOUT_MS = 90_000;

let browser: Browser;

beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

async function signedInPlanner(): Promise<Page> {
  const context = await browser.newContext({ viewport: PHONE });
  const page = await context.newPage();
  await submitSignIn(page, 'planner@demo.test');
  await page.getByTestId('overview-sites').waitFor({ timeout: 30_000 });
  return page;
}

/** Assesses the window when its impact is not stored yet (a fresh demo database starts in draft). */
async function openAssessedWindow(page: Page): Promise<void> {
  await page.goto(`${BASE_URL}/windows/${WINDOW_ID}`);
  await page.getByTestId('window-status').waitFor({ timeout: 30_000 });
  if ((await page.getByTestId('window-status').innerText()).includes('Draft')) {
    await page.getByTestId('next-step-action').click();
    await page.getByTestId('impact-computed').waitFor({ timeout: 60_000 });
    await page.getByTestId('impact-back').click();
  }
  await page.getByTestId('window-plans-open').waitFor({ timeout: 30_000 });
}

type ProgressReading = { percent: number; round: string };

async function readProgress(page: Page): Promise<ProgressReading | null> {
  return page.evaluate(() => {
    const bar = document.querySelector('[data-testid="plan-progress-bar"]');
    const round = document.querySelector('[data-testid="plan-progress-generation"]');
    if (!bar || !round) return null;
    return { percent: Number(bar.getAttribute('aria-valuenow') ?? '0'), round: round.textContent ?? '' };
  });
}

/** Polls the page until the bar has grown or the round changed since `first`, within the run's time. */
async function waitForAdvance(page: Page, first: ProgressReading): Promise<ProgressReading> {
  const deadline = Date.now() + RESULT_TIMEOUT_MS;
  while (Date.now() < deadline) {
    const now = await readProgress(page);
    // Only real movement counts: a wider bar, or a higher round once rounds are being counted ('–' while queued).
    if (now && (now.percent > first.percent || Number(now.round) > Number(first.round))) return now;
    if (!now) throw new Error('the run finished before the progress bar was seen to move');
    await page.waitForTimeout(250);
  }
  throw new Error('the progress bar did not move');
}

test('a planner runs a plan for a demo window, watches it progress, reviews it and accepts it', async () => {
  const page = await signedInPlanner();
  await openAssessedWindow(page);
  await page.getByTestId('window-plans-open').click();

  await page.getByTestId('plans-new-run').click();
  await page.getByTestId('plan-form-time-limit').fill(String(TIME_LIMIT_SECONDS));
  await page.screenshot({ path: path.join(SHOTS, 'plans-form-phone.png'), fullPage: true });
  await page.getByTestId('plan-form-submit').click();

  await page.getByTestId('plan-progress').waitFor({ timeout: 30_000 });
  const urlWhileRunning = page.url();
  const first = await readProgress(page);
  expect(first).not.toBeNull();
  const later = await waitForAdvance(page, first!);
  expect(later.percent > first!.percent || Number(later.round) > Number(first!.round)).toBe(true);
  await page.screenshot({ path: path.join(SHOTS, 'plans-progress-phone.png'), fullPage: true });

  // The review replaces the progress on the same page: no reload, no navigation.
  await page.getByTestId('plan-review').waitFor({ timeout: RESULT_TIMEOUT_MS });
  expect(page.url()).toBe(urlWhileRunning);
  await eventually(async () => expect(Number(await page.getByTestId('plan-total-moved').innerText())).toBeGreaterThan(0));
  await eventually(async () => expect(await page.locator('[data-testid^="plan-move-"]').count()).toBeGreaterThan(0));
  await page.getByTestId('plan-map').getByTestId('network-map').waitFor({ timeout: 30_000 });
  await eventually(async () => expect(await page.getByTestId('plan-steps').isVisible()).toBe(true));
  await page.screenshot({ path: path.join(SHOTS, 'plans-review-phone.png'), fullPage: true });

  // Any slice left unresolved needs its outage ticked before the plan can be accepted.
  for (const tick of await page.locator('[data-testid^="plan-outage-"]').all()) await tick.click();
  await page.getByTestId('plan-accept').click();
  await page.getByTestId('plan-accept-yes').click();
  await page.getByTestId('plan-accepted').waitFor({ timeout: 30_000 });
  await eventually(async () => expect(await page.getByTestId('plan-status').innerText()).toContain('Finished'));

  await page.getByTestId('plan-back').click();
  await page.getByTestId('plans-back').click();
  await page.getByTestId('window-plans-accepted').waitFor({ timeout: 30_000 });
  await eventually(async () => expect(await page.getByTestId('window-status').innerText()).toContain('Planned'));
  await page.screenshot({ path: path.join(SHOTS, 'plans-window-planned-phone.png'), fullPage: true });
  await page.context().close();
});
