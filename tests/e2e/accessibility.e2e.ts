// Every screen each demo role can reach, on a phone (390×844) and a wide screen (1280×800), checked by axe-core
// against WCAG 2.0 and 2.1 levels A and AA with the app's own Content Security Policy in force (see helpers/axe.ts
// for how axe gets into the page without weakening it). A serious or critical violation fails the screen; the
// failure lists every violation on it (rule, impact, count, first element) so the fix can start from the output.
// Moderate and minor ones are printed too, and all findings go to test-results/e2e/accessibility.json.
//
// The data the screens need is prepared through the API: a notified window on a site that hosts only the demo
// tenant's slices (its plans, its Outbox mail, the tenant's notice) and a window waiting for sign-off (the queue and
// the decision screen). The sign-off policy is set to one approval without a code and put back afterwards; both
// windows are withdrawn at the end. A role only visits the screens its roles open (shared/permissions), so a screen
// that does not exist for a role is left out of that role's list rather than failing.
import type { Page } from 'playwright-core';
import fs from 'node:fs';
import path from 'node:path';
import type { RoleName } from '../../shared/api';
import {
  ADMIN_ROLES, AUDIT_READER_ROLES, CAMPAIGN_PLANNER_ROLES, CAMPAIGN_READER_ROLES, CHANGE_PACK_READER_ROLES, holdsAnyRole,
  INVENTORY_IMPORT_ROLES, OPERATOR_ROLES, PLAN_READER_ROLES, SIGNOFF_QUEUE_ROLES, SLOT_SEARCH_ROLES, TENANT_PORTAL_ROLES,
  WINDOW_BOOKER_ROLES,
} from '../../shared/permissions';
import { ok, prepareNotifiedWindow, prepareSubmittedWindow, slotAhead } from './helpers/api';
import { describeFinding, isBlocking, runAxe, summarise, type Finding } from './helpers/axe';
import { BASE_URL, SHOTS, submitSignIn } from './helpers/browser';
import { suiteUnderPolicies } from './helpers/suite';
import { eventually } from './helpers/eventually';

const SIZES = [
  { name: 'phone', viewport: { width: 390, height: 844 } },
  { name: 'wide', viewport: { width: 1280, height: 800 } },
] as const;

/** Hosts only the demo tenant's (Crannock Quay Logistics) slices, so its notice reaches the demo tenant user. */
const SITE_ID = 'cell-yarrowmouth';
const TENANT_ID = 't-crannock-logistics';
/** Clear of the other suites' days (4, 9, 23, 25, 26, 28, 30) and beyond the longest demo lead time (21 days). */
const NOTIFIED_DAYS_AHEAD = 33;
const IN_REVIEW_DAYS_AHEAD = 34;

const ROLES: { email: string; role: RoleName }[] = [
  { email: 'admin@demo.test', role: 'admin' },
  { email: 'engineer@demo.test', role: 'engineer' },
  { email: 'planner@demo.test', role: 'planner' },
  { email: 'approver@demo.test', role: 'approver' },
  { email: 'tenant@demo.test', role: 'tenant' },
];

/** The ids the screens' addresses need, found once the data is prepared. */
type Data = { windowId: string; inReviewId: string; planId: string; sliceId: string; spanId: string; messageId: string; noticeId: string };

type Screen = {
  name: string;
  path: (d: Data) => string;
  /** What shows once the screen has its data (a selector; the first match is waited for). */
  ready: string;
  /** Roles that open the screen (a set from shared/permissions); unset = everyone signed in. */
  roles?: readonly RoleName[];
};

const id = (testId: string) => `[data-testid="${testId}"]`;

const SCREENS: Screen[] = [
  { name: 'overview', path: () => '/', ready: id('overview-sites') },
  { name: 'calendar', path: () => '/calendar', ready: id('calendar-month-title') },
  // A tenant user reaching a window's address gets its tenant view of the work.
  { name: 'window', path: (d) => `/windows/${d.windowId}`, ready: `${id('window-title-heading')}, ${id('tenant-window')}` },
  { name: 'window impact', path: (d) => `/windows/${d.windowId}/impact`, ready: id('impact-window-status'), roles: OPERATOR_ROLES },
  { name: 'move plans', path: (d) => `/windows/${d.windowId}/plans`, ready: id('plans-window-status'), roles: PLAN_READER_ROLES },
  { name: 'move plan', path: (d) => `/windows/${d.windowId}/plans/${d.planId}`, ready: id('plan-review'), roles: PLAN_READER_ROLES },
  // Both forms hold the same fields; their headings tell them apart.
  { name: 'book a window', path: () => '/windows/new', ready: 'role=heading[name="Book a window"]', roles: WINDOW_BOOKER_ROLES },
  { name: 'edit a window', path: (d) => `/windows/${d.windowId}/edit`, ready: 'role=heading[name=/^Edit: /]', roles: WINDOW_BOOKER_ROLES },
  { name: 'find a slot', path: () => '/slots', ready: id('slot-form'), roles: SLOT_SEARCH_ROLES },
  { name: 'campaigns', path: () => '/campaigns', ready: 'role=heading[name="Campaigns"]', roles: CAMPAIGN_READER_ROLES },
  { name: 'new campaign', path: () => '/campaigns/new', ready: id('campaign-form'), roles: CAMPAIGN_PLANNER_ROLES },
  { name: 'slices', path: () => '/slices', ready: id('slices-table') },
  { name: 'slice', path: (d) => `/slices/${d.sliceId}`, ready: id('slice-detail-title') },
  { name: 'network', path: () => '/network', ready: id('sites-table') },
  { name: 'site', path: () => `/network/sites/${SITE_ID}`, ready: id('site-detail-title') },
  { name: 'span', path: (d) => `/network/spans/${d.spanId}`, ready: id('span-detail') },
  { name: 'map', path: () => '/map', ready: id('network-map') },
  // Freezes may be none; staff without the admin role then see the empty state.
  { name: 'freezes', path: () => '/freezes', ready: `${id('freeze-list')}, ${id('state-empty')}`, roles: OPERATOR_ROLES },
  { name: 'imports', path: () => '/imports', ready: id('imports-screen'), roles: INVENTORY_IMPORT_ROLES },
  { name: 'outbox', path: () => '/outbox', ready: id('outbox-list'), roles: ADMIN_ROLES },
  { name: 'outbox message', path: (d) => `/outbox/${d.messageId}`, ready: id('outbox-message-title'), roles: ADMIN_ROLES },
  { name: 'sign-off queue', path: () => '/sign-off', ready: '[data-testid^="signoff-queue-item-"]', roles: SIGNOFF_QUEUE_ROLES },
  { name: 'sign-off decision', path: (d) => `/sign-off/${d.inReviewId}`, ready: id('signoff-title'), roles: SIGNOFF_QUEUE_ROLES },
  { name: 'sign-off policy', path: () => '/sign-off/policy', ready: id('signoff-policy'), roles: ADMIN_ROLES },
  { name: 'security', path: () => '/security', ready: id('sessions-list') },
  { name: 'change-board pack', path: (d) => `/windows/${d.windowId}/pack`, ready: id('change-pack'), roles: CHANGE_PACK_READER_ROLES },
  { name: 'people', path: () => '/people', ready: id('people-list'), roles: ADMIN_ROLES },
  { name: 'audit trail', path: () => '/audit', ready: `${id('audit-list')}, ${id('state-empty')}`, roles: AUDIT_READER_ROLES },
  { name: 'single sign-on', path: () => '/settings/sso', ready: id('sso-issuer'), roles: ADMIN_ROLES },
  { name: 'demo data', path: () => '/demo-data', ready: `${id('demo-data-panel')}, ${id('state-empty')}`, roles: ADMIN_ROLES },
  { name: 'notices', path: () => '/notices', ready: id('notices-list'), roles: TENANT_PORTAL_ROLES },
  { name: 'notice', path: (d) => `/notices/${d.noticeId}`, ready: id('notice-view-title'), roles: TENANT_PORTAL_ROLES },
];

const screensFor = (role: RoleName) => SCREENS.filter((s) => !s.roles || holdsAnyRole([role], s.roles));

const suite = suiteUnderPolicies({ signoffQuorumLow: 1, signoffQuorumHigh: 1, signoffRequireCode: false });
let data: Data;
/** Every screen's findings, written out at the end for whoever fixes them. */
const report: { role: string; size: string; screen: string; path: string; findings: Finding[] }[] = [];

const apiAs = (email: string) => suite.apiAs(email);

beforeAll(async () => {
  const admin = suite.admin;
  const planner = await apiAs('planner@demo.test');
  const tenant = await apiAs('tenant@demo.test');
  const booking = (days: number) => ({
    title: `E2E accessibility ${days} ${Date.now().toString(36)}`, ...slotAhead(days, 2), workType: 'hardware replacement',
    elements: [{ kind: 'site' as const, id: SITE_ID, effect: 'down' as const }],
  });
  const windowId = await prepareNotifiedWindow(planner, await apiAs('approver@demo.test'), booking(NOTIFIED_DAYS_AHEAD));
  suite.windowIds.push(windowId);
  const inReviewId = await prepareSubmittedWindow(planner, booking(IN_REVIEW_DAYS_AHEAD));
  suite.windowIds.push(inReviewId);
  // The tenant sees the window once its notice is out (the worker sends it a moment after the approval).
  await eventually(async () => expect((await tenant.get(`${BASE_URL}/api/windows/${windowId}`)).status()).toBe(200), 60_000);

  const plans = await ok(planner.get(`${BASE_URL}/api/windows/${windowId}/plans`), 'plans');
  const notices = await ok(admin.get(`${BASE_URL}/api/windows/${windowId}/notices`), 'window notices');
  const notice = notices.notices.find((n: { tenantId: string }) => n.tenantId === TENANT_ID);
  // The tenant's own slice and a span it sees, so every role opens the same detail screens.
  const slices = await ok(tenant.get(`${BASE_URL}/api/slices`), 'slices');
  const spans = await ok(tenant.get(`${BASE_URL}/api/spans`), 'spans');
  const outbox = await ok(admin.get(`${BASE_URL}/api/outbox`), 'outbox');
  if (!plans.plans[0] || !notice || !slices.items[0] || !spans.items[0] || !outbox.items[0]) {
    throw new Error('the prepared data lacks a plan, the tenant notice, a slice, a span or an Outbox message');
  }
  data = {
    windowId, inReviewId, planId: plans.plans[0].id, noticeId: notice.id,
    sliceId: slices.items[0].id, spanId: spans.items[0].id, messageId: String(outbox.items[0].id),
  };
}, 240_000);

afterAll(async () => {
  fs.mkdirSync(SHOTS, { recursive: true });
  fs.writeFileSync(path.join(SHOTS, 'accessibility.json'), JSON.stringify(report, null, 2));
});

/**
 * Opens `address` in the signed-in app. The first visit loads the page; later ones move inside the running app the
 * way the browser's back and forward buttons do (a history entry, then popstate, which the router follows), so the
 * screen is the one a person reaches by a link, without reloading the bundle and axe for every screen.
 */
async function visit(page: Page, address: string) {
  if (new URL(page.url()).origin !== new URL(BASE_URL).origin) {
    await page.goto(`${BASE_URL}${address}`);
    return;
  }
  await page.evaluate((to) => {
    window.history.pushState(null, '', to);
    window.dispatchEvent(new PopStateEvent('popstate', { state: null }));
  }, address);
}

/** Waits for the screen's own content, for every loading state on it to end, and for the fonts. */
async function settle(page: Page, address: string, ready: string) {
  await page.locator(ready).first().waitFor({ state: 'visible', timeout: 30_000 });
  expect(new URL(page.url()).pathname).toBe(address);
  await eventually(async () => {
    // Any spinner counts: a table or a lazily loaded part of the screen may still be loading after its heading shows.
    expect(await page.locator(`${id('state-loading')}, ${id('inventory-map-loading')}, ${id('state-error')}, [role="progressbar"]`).count()).toBe(0);
  }, 20_000);
  await page.evaluate(() => document.fonts.ready.then(() => undefined));
  // Let a fade-in or a layout pass that follows the data finish before colours and sizes are read.
  await page.waitForTimeout(200);
}

test('the pages are served with a Content Security Policy that refuses inline script', async () => {
  const context = await suite.browser.newContext();
  suite.contexts.push(context);
  const page = await context.newPage();
  const response = await page.goto(`${BASE_URL}/sign-in`);
  expect(response?.headers()['content-security-policy']).toMatch(/script-src 'self'(;|$)/);
  // An inline <script> added to the page is refused by the policy (it runs under the page's rules, unlike
  // page.evaluate itself), which is why axe is evaluated through the DevTools protocol rather than injected as a tag.
  const ran = await page.evaluate(async () => {
    const script = document.createElement('script');
    script.textContent = 'document.documentElement.dataset.inlineRan = "yes";';
    document.head.appendChild(script);
    await new Promise((resolve) => setTimeout(resolve, 50));
    return document.documentElement.dataset.inlineRan ?? 'no';
  });
  expect(ran).toBe('no');
});

/** Screens before sign-in; a made-up token shows each link page's "this link no longer works" state. */
const SIGNED_OUT_SCREENS = [
  { name: 'sign-in', path: '/sign-in', ready: id('sign-in-email') },
  { name: 'forgot password', path: '/forgot-password', ready: id('forgot-password-email') },
  { name: 'reset password, spent link', path: `/reset-password?token=${'A'.repeat(43)}`, ready: id('reset-password-ask-again') },
  { name: 'invitation, spent link', path: `/invitation?token=${'A'.repeat(43)}`, ready: id('invitation-sign-in') },
  { name: 'first-admin set-up, spent link', path: `/set-up?token=${'A'.repeat(43)}`, ready: id('set-up-sign-in') },
];

describe.each(SIZES)('signed out at $name size', (size) => {
  test.each(SIGNED_OUT_SCREENS)('$name has no serious or critical WCAG 2.1 AA violation', async (screen) => {
    const context = await suite.browser.newContext({ viewport: size.viewport });
    suite.contexts.push(context);
    const page = await context.newPage();
    await page.goto(`${BASE_URL}${screen.path}`);
    // A spent link's page is an error state by design, so only its own content and the fonts are waited for.
    await page.locator(screen.ready).first().waitFor({ state: 'visible', timeout: 30_000 });
    await page.evaluate(() => document.fonts.ready.then(() => undefined));
    await page.waitForTimeout(200);
    const findings = await runAxe(page);
    report.push({ role: 'signed out', size: size.name, screen: screen.name, path: screen.path, findings });
    if (findings.length > 0) console.log(summarise(`signed out · ${size.name} · ${screen.name}`, findings));
    expect(findings.filter(isBlocking).map(describeFinding)).toEqual([]);
  });
});

describe.each(ROLES.flatMap((r) => SIZES.map((size) => ({ ...r, size }))))('$role at $size.name size', ({ email, role, size }) => {
  let page: Page;

  beforeAll(async () => {
    const context = await suite.browser.newContext({ viewport: size.viewport });
    suite.contexts.push(context);
    page = await context.newPage();
    await submitSignIn(page, email);
    await page.getByTestId('overview-sites').waitFor({ timeout: 30_000 });
  });

  test.each(screensFor(role).map((s) => ({ ...s, label: s.name })))('$label has no serious or critical WCAG 2.1 AA violation', async (screen) => {
    const address = screen.path(data);
    await visit(page, address);
    await settle(page, address, screen.ready);
    const findings = await runAxe(page);
    report.push({ role, size: size.name, screen: screen.name, path: address, findings });
    const title = `${role} · ${size.name} · ${screen.name} (${address})`;
    if (findings.length > 0) console.log(summarise(title, findings));
    expect(findings.filter(isBlocking).map(describeFinding)).toEqual([]);
  });
});
