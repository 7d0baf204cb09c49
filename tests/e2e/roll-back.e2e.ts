// Work that goes wrong is rolled back from the window page on a phone (390×844): the planner starts the work
// through the next step, which moves the plan's slices, then rolls it back after a confirmation. The window ends
// Rolled back and every slice the plan moved is on its sites from before the window again. The window is prepared
// through the API under a one-approval, no-code sign-off policy (put back afterwards).
import { ok, prepareNotifiedWindow, slotAhead } from './helpers/api';
import { BASE_URL, screenshotPath, submitSignIn } from './helpers/browser';
import { eventually } from './helpers/eventually';
import { suiteUnderPolicies } from './helpers/suite';

const PHONE = { width: 390, height: 844 };
/** Hosts only the demo tenant's slices; the day is clear of the other suites' days. */
const SITE_ID = 'cell-yarrowmouth';
const DAYS_AHEAD = 37;

type SliceDetail = { functions: { id: string; siteId: string | null }[]; history: { current: boolean; reason: string }[] };

const suite = suiteUnderPolicies({ signoffQuorumLow: 1, signoffQuorumHigh: 1, signoffRequireCode: false });

test('a planner starts the work, rolls it back after confirming, and the moved slices are back where they were', async () => {
  const planner = await suite.apiAs('planner@demo.test');
  const windowId = await prepareNotifiedWindow(planner, await suite.apiAs('approver@demo.test'), {
    title: `E2E roll back ${Date.now().toString(36)}`, ...slotAhead(DAYS_AHEAD, 2), workType: 'hardware replacement',
    elements: [{ kind: 'site', id: SITE_ID, effect: 'down' }],
  });
  suite.windowIds.push(windowId);
  const runs = (await ok(planner.get(`${BASE_URL}/api/windows/${windowId}/plans`), 'plans')).plans as { id: string; accepted: boolean }[];
  const accepted = runs.find((r) => r.accepted);
  expect(accepted).toBeDefined();
  const review = (await ok(planner.get(`${BASE_URL}/api/plans/${accepted!.id}`), 'plan')).plan.review;
  const moved = (review.slices as { slice: string; outcome: string }[]).filter((s) => s.outcome === 'move').map((s) => s.slice);
  // The site hosts slices whose functions must leave it, so the plan moves at least one.
  expect(moved.length).toBeGreaterThan(0);
  const sliceSites = async (id: string) => {
    const detail = (await ok(planner.get(`${BASE_URL}/api/slices/${encodeURIComponent(id)}`), 'slice')) as SliceDetail;
    return { sites: Object.fromEntries(detail.functions.map((f) => [f.id, f.siteId])), reason: detail.history.find((h) => h.current)?.reason };
  };
  const before = await Promise.all(moved.map(sliceSites));

  const context = await suite.browser.newContext({ viewport: PHONE });
  suite.contexts.push(context);
  const page = await context.newPage();
  await submitSignIn(page, 'planner@demo.test');
  await page.getByTestId('overview-sites').waitFor({ timeout: 30_000 });
  await page.goto(`${BASE_URL}/windows/${encodeURIComponent(windowId)}`);
  await eventually(async () => expect(await page.getByTestId('next-step-action').innerText()).toMatch(/Start the work/));
  await page.getByTestId('next-step-action').click();
  await eventually(async () => expect(await page.getByTestId('window-status').innerText()).toMatch(/Underway/));
  // Underway, the plan's moves are in the network.
  const during = await Promise.all(moved.map(sliceSites));
  expect(during.map((d) => d.sites)).not.toEqual(before.map((b) => b.sites));

  await page.getByTestId('window-roll-back').click();
  const confirm = page.getByTestId('window-roll-back-confirm');
  expect(await confirm.innerText()).toMatch(/Every slice the plan moved goes back to where it was before the window/);
  await page.screenshot({ path: screenshotPath('roll-back-confirm-phone.png'), fullPage: true });
  await page.getByTestId('window-roll-back-yes').click();
  await eventually(async () => expect(await page.getByTestId('window-status').innerText()).toMatch(/Rolled back/));
  expect(await page.getByTestId('window-roll-back').count()).toBe(0);

  const after = await Promise.all(moved.map(sliceSites));
  expect(after.map((a) => a.sites)).toEqual(before.map((b) => b.sites));
  for (const a of after) expect(a.reason).toMatch(/:rollback$/);
  const w = await ok(planner.get(`${BASE_URL}/api/windows/${windowId}`), 'window');
  expect(w.status).toBe('rolled-back');
});
