// The whole job at both sizes (390×844 and 1280×800), through the screens: a planner follows the one next step
// from a booked window to its impact, a plan run, the accepted plan and sign-off; two approvers approve. At each
// screen the primary action must be the next step, and the counts of slices must agree between impact, plan and
// sign-off (touched, must move, lose protection, cannot be kept, moved to make room). Sign-off must list every
// tenant with a touched slice. The window is booked through the API (booking itself is windows.e2e.ts) on a site
// whose slices belong to more than one tenant. Sign-off is set to two approvals without codes for the test (codes
// are signoff.e2e.ts) and put back afterwards; the windows are withdrawn at the end.
import type { Page } from 'playwright-core';
import { ok, slotAhead } from './helpers/api';
import { BASE_URL, screenshotPath, submitSignIn } from './helpers/browser';
import { suiteUnderPolicies } from './helpers/suite';
import { eventually } from './helpers/eventually';

const PLAN_TIME_LIMIT_SECONDS = 3;
const RESULT_TIMEOUT_MS = 90_000;
/** What the impact screen can count before any plan exists. */
const IMPACT_KEYS = ['touched', 'mustMove', 'protectionLost'] as const;
const PLAN_KEYS = [...IMPACT_KEYS, 'unresolved', 'knockOn'] as const;

type Size = { name: 'phone' | 'wide'; viewport: { width: number; height: number }; site: string; daysAhead: number };
// Demo sites whose slices belong to two and three tenants; days clear of the other suites (4, 9, 23, 25, 26) and
// beyond the longest demo notice lead time (21 days).
const SIZES: Size[] = [
  { name: 'phone', viewport: { width: 390, height: 844 }, site: 'agg-sollowmere', daysAhead: 28 },
  { name: 'wide', viewport: { width: 1280, height: 800 }, site: 'edge-lirrenford', daysAhead: 30 },
];

const suite = suiteUnderPolicies({ signoffQuorumLow: 2, signoffQuorumHigh: 2, signoffRequireCode: false });

/** The page in use, for a screenshot of where a failing run stopped. */
let current: Page | null = null;

async function signedIn(email: string, size: Size): Promise<Page> {
  const context = await suite.browser.newContext({ viewport: size.viewport });
  suite.contexts.push(context);
  const page = await context.newPage();
  current = page;
  await submitSignIn(page, email);
  await page.getByTestId(size.name === 'phone' ? 'bottom-tabs' : 'side-rail').waitFor({ timeout: 30_000 });
  return page;
}

/**
 * The next-step bar names `label`; with `button`, its button (the page's primary action) carries that name. A step
 * taken on the page itself (accepting, on the plan's own page) has no button in the bar.
 */
async function expectNextStep(page: Page, label: string, button = true) {
  await eventually(async () => {
    const bar = page.getByTestId('next-step').filter({ visible: true }).first();
    expect(await bar.getAttribute('aria-label')).toBe(`Next step: ${label}`);
    if (button) expect((await bar.getByTestId('next-step-action').innerText()).trim()).toBe(label);
  }, 60_000);
}

async function readCounts(page: Page, keys: readonly string[]): Promise<Record<string, number>> {
  const scope = page.getByTestId('touch-counts').filter({ visible: true }).first();
  await scope.waitFor({ timeout: 30_000 });
  const counts: Record<string, number> = {};
  for (const key of keys) {
    const text = await scope.getByTestId(`touch-count-${key}`).innerText();
    const value = Number(/\d+/.exec(text)?.[0]);
    expect(Number.isInteger(value)).toBe(true);
    counts[key] = value;
  }
  return counts;
}

async function approveAs(email: string, size: Size, windowId: string, expected: Record<string, number>, tenantIds: Set<string>) {
  const page = await signedIn(email, size);
  await page.goto(`${BASE_URL}/sign-off/${windowId}`);
  await page.getByTestId('signoff-title').waitFor({ timeout: 30_000 });
  await eventually(async () => expect(await readCounts(page, PLAN_KEYS)).toEqual(expected));
  // Every tenant with a touched slice is named to the approver, not only the ones whose slices move.
  for (const tenantId of tenantIds) await page.getByTestId(`signoff-tenant-${tenantId}`).waitFor({ timeout: 30_000 });
  await page.screenshot({ path: screenshotPath(`whole-job-${size.name}-signoff-${email.split('@')[0]}.png`), fullPage: true });
  await page.getByTestId('signoff-comment').fill('Moves and notice checked.');
  await page.getByTestId('signoff-approve').click();
  await page.getByTestId('signoff-decisions').getByText('Moves and notice checked.').first().waitFor({ timeout: 30_000 });
  await page.context().close();
}

describe.each(SIZES)('the whole job on the $name layout', (size) => {
  test('every screen offers the next step and counts the same slices', async () => {
    try {
      await wholeJob(size);
    } catch (error) {
      await current?.screenshot({ path: screenshotPath(`whole-job-${size.name}-failed.png`), fullPage: true }).catch(() => undefined);
      throw error;
    }
  });
});

async function wholeJob(size: Size) {
    const planner = await suite.apiAs('planner@demo.test');
    const booked = await ok(planner.post(`${BASE_URL}/api/windows`, {
      data: {
        title: `E2E whole job ${size.name} ${Date.now().toString(36)}`, ...slotAhead(size.daysAhead, 1), workType: 'software upgrade',
        elements: [{ kind: 'site', id: size.site, effect: 'down' }],
      },
    }), 'book');
    const windowId = booked.window.id as string;
    suite.windowIds.push(windowId);

    // Window: booked, so the next step is the assessment.
    const page = await signedIn('planner@demo.test', size);
    await page.goto(`${BASE_URL}/windows/${windowId}`);
    await page.getByTestId('window-title-heading').waitFor({ timeout: 30_000 });
    await expectNextStep(page, 'Assess impact');
    await page.screenshot({ path: screenshotPath(`whole-job-${size.name}-1-booked.png`), fullPage: true });
    await page.getByTestId('next-step-action').filter({ visible: true }).click();
    await expectNextStep(page, 'Plan the moves');

    // Impact: the counts before any plan, and the way on to planning.
    if (!(await page.getByTestId('touch-counts').filter({ visible: true }).count())) await page.getByTestId('window-open-impact').click();
    await page.getByTestId('impact-computed').waitFor({ timeout: 60_000 });
    const impactCounts = await readCounts(page, IMPACT_KEYS);
    expect(impactCounts.touched).toBe(impactCounts.mustMove + impactCounts.protectionLost);
    expect(impactCounts.mustMove).toBeGreaterThan(0);
    await expectNextStep(page, 'Plan the moves');
    await page.screenshot({ path: screenshotPath(`whole-job-${size.name}-2-impact.png`), fullPage: true });
    const impact = await ok(planner.get(`${BASE_URL}/api/windows/${windowId}/impact`), 'impact');
    const tenantIds = new Set<string>(impact.affected.map((s: { tenant: { id: string } }) => s.tenant.id));
    expect(tenantIds.size).toBeGreaterThan(1);
    expect(impact.affected.length).toBe(impactCounts.touched);

    // Plans: one short run; its review counts the same touched slices.
    await page.getByTestId('next-step-action').filter({ visible: true }).click();
    // Phones open the run form from a button; the wide layout shows it beside the (empty) list of runs.
    await page.locator('[data-testid="plans-new-run"], [data-testid="plan-form-time-limit"]').first().waitFor({ timeout: 30_000 });
    if (await page.getByTestId('plans-new-run').isVisible()) await page.getByTestId('plans-new-run').click();
    await page.getByTestId('plan-form-time-limit').fill(String(PLAN_TIME_LIMIT_SECONDS));
    await page.getByTestId('plan-form-submit').click();
    await page.getByTestId('plan-review').waitFor({ timeout: RESULT_TIMEOUT_MS });
    const planCounts = await readCounts(page, PLAN_KEYS);
    for (const key of IMPACT_KEYS) expect(planCounts[key]).toBe(impactCounts[key]);
    await expectNextStep(page, 'Review and accept', false);
    await page.screenshot({ path: screenshotPath(`whole-job-${size.name}-3-plan.png`), fullPage: true });

    // Accepting asks once more and says what it commits to; then the next step is sign-off.
    for (const tick of await page.locator('[data-testid^="plan-outage-"]').all()) await tick.click();
    await page.getByTestId('plan-accept').click();
    await page.getByTestId('plan-accept-confirm').waitFor({ timeout: 30_000 });
    await page.screenshot({ path: screenshotPath(`whole-job-${size.name}-4-accept-confirm.png`), fullPage: true });
    await page.getByTestId('plan-accept-yes').click();
    await page.getByTestId('plan-accepted').waitFor({ timeout: 30_000 });
    await expectNextStep(page, 'Submit for sign-off');
    await page.getByTestId('next-step-action').filter({ visible: true }).click();
    await eventually(async () => {
      const w = await ok(planner.get(`${BASE_URL}/api/windows/${windowId}`), 'window');
      expect(w.status).toBe('in-review');
    });
    await page.context().close();

    // Sign-off: the same counts, every touched tenant named; two approvals clear the window.
    await approveAs('approver@demo.test', size, windowId, planCounts, tenantIds);
    await approveAs('approver2@demo.test', size, windowId, planCounts, tenantIds);
    await eventually(async () => {
      const w = await ok(planner.get(`${BASE_URL}/api/windows/${windowId}`), 'window');
      expect(['cleared', 'notified']).toContain(w.status);
    });
}
