// The API as a demo user, for suites that prepare their data without the browser: sign in, check replies, take a
// window from booked to submitted for sign-off, change the sign-off policy for a test, withdraw a window afterwards.
import type { APIRequestContext, APIResponse, Browser, BrowserContext } from 'playwright-core';
import { BASE_URL, DEMO_PASSWORD } from './browser';

const PLAN_TIMEOUT_MS = 90_000;
export const SIGNOFF_POLICY_KEYS = ['signoffQuorumLow', 'signoffQuorumHigh', 'signoffRequireCode'] as const;

/** Signs `email` in on a fresh browser context (added to `opened`, for the suite to close) and returns its API. */
export async function apiAs(browser: Browser, email: string, opened: BrowserContext[]): Promise<APIRequestContext> {
  const context = await browser.newContext();
  opened.push(context);
  const res = await context.request.post(`${BASE_URL}/api/auth/sign-in`, { data: { email, password: DEMO_PASSWORD } });
  if (!res.ok()) throw new Error(`sign-in as ${email}: ${res.status()}`);
  return context.request;
}

/** The reply's JSON (null for 204); throws with the status and body when it is not a success. */
export async function ok(res: Promise<APIResponse>, what: string) {
  const r = await res;
  if (!r.ok()) throw new Error(`${what}: ${r.status()} ${await r.text()}`);
  return r.status() === 204 ? null : r.json();
}

export type Booking = {
  title: string; startsAt: string; endsAt: string; workType: string;
  elements: { kind: 'site' | 'span'; id: string; effect: 'down' }[];
};

/** `days` ahead at `utcHour`:00, lasting `hours`: startsAt/endsAt for a Booking. */
export function slotAhead(days: number, utcHour: number, hours = 3): Pick<Booking, 'startsAt' | 'endsAt'> {
  const start = new Date(Date.now() + days * 86_400_000);
  start.setUTCHours(utcHour, 0, 0, 0);
  return { startsAt: start.toISOString(), endsAt: new Date(start.getTime() + hours * 3_600_000).toISOString() };
}

/** Books and assesses the window, runs a short plan and waits for it to finish. */
async function bookAndPlan(planner: APIRequestContext, booking: Booking) {
  const booked = await ok(planner.post(`${BASE_URL}/api/windows`, { data: booking }), 'book');
  const windowId = booked.window.id as string;
  await ok(planner.post(`${BASE_URL}/api/windows/${windowId}/assess`, { data: {} }), 'assess');
  let plan = (await ok(planner.post(`${BASE_URL}/api/windows/${windowId}/plans`, { data: { timeLimitSeconds: 2 } }), 'plan')).plan;
  const deadline = Date.now() + PLAN_TIMEOUT_MS;
  while (plan.status !== 'done') {
    if (['failed', 'cancelled'].includes(plan.status) || Date.now() > deadline) throw new Error(`plan run ${plan.status}: ${plan.error}`);
    await new Promise((resolve) => setTimeout(resolve, 1000));
    plan = (await ok(planner.get(`${BASE_URL}/api/plans/${plan.id}`), 'plan read')).plan;
  }
  return { windowId, plan };
}

/** Book, assess, plan, accept (naming every unresolved slice's outage) and submit as the planner; returns the window id. */
export async function prepareSubmittedWindow(planner: APIRequestContext, booking: Booking): Promise<string> {
  const { windowId, plan } = await bookAndPlan(planner, booking);
  const outageAccepted = plan.review.slices.filter((s: { outcome: string }) => s.outcome === 'unresolved').map((s: { slice: string }) => s.slice);
  await ok(planner.post(`${BASE_URL}/api/plans/${plan.id}/accept`, { data: { outageAccepted } }), 'accept');
  await ok(planner.post(`${BASE_URL}/api/windows/${windowId}/submit`, { data: {} }), 'submit');
  return windowId;
}

/**
 * As prepareSubmittedWindow, then one approval: with a quorum of one and no code required (setSignoffPolicies),
 * the window is cleared and its notices go out. Returns the window id.
 */
export async function prepareNotifiedWindow(planner: APIRequestContext, approver: APIRequestContext, booking: Booking): Promise<string> {
  const windowId = await prepareSubmittedWindow(planner, booking);
  await ok(approver.post(`${BASE_URL}/api/signoff/${windowId}/decision`, {
    data: { decision: 'approve', comment: 'Moves checked; the tenant is owed its notice.' },
  }), 'approve');
  return windowId;
}

/** Sets sign-off policies as the admin; returns their earlier values, for putting back after the test. */
export async function setSignoffPolicies(admin: APIRequestContext, values: Record<(typeof SIGNOFF_POLICY_KEYS)[number], unknown>) {
  const before = (await ok(admin.get(`${BASE_URL}/api/policies`), 'policies')).policies;
  const saved: Record<string, unknown> = Object.fromEntries(SIGNOFF_POLICY_KEYS.map((k) => [k, before[k]]));
  await ok(admin.patch(`${BASE_URL}/api/policies`, { data: values }), 'policy');
  return saved;
}

/** Best effort, for afterAll: withdraws the window at its current version (which also sends any cancellations). */
export async function withdrawWindow(api: APIRequestContext, windowId: string): Promise<void> {
  const w = await (await api.get(`${BASE_URL}/api/windows/${windowId}`)).json();
  await api.post(`${BASE_URL}/api/windows/${windowId}/transition`, { data: { to: 'withdrawn', version: w.version } }).catch(() => undefined);
}
