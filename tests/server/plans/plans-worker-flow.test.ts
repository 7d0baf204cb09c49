// The whole plan flow through the API with a real queue and worker (pg-boss + the plan-run worker and its
// thread): a planner enqueues a run, the worker completes it with progress on the way, the planner accepts it
// and the window is planned.
import { planResponseSchema, type Plan } from '../../../shared/plans';
import { signedInRequests } from '../helpers/sign-in';
import { startTestJobs, type TestJobs } from '../helpers/jobs';
import { bookAssessed, closePlansApp, setupPlansNetwork, windowRow, type PlansContext } from './helpers';

// This file books in January 2028 only (other plans files use other months: reservations follow time overlap).
const NOW = new Date('2027-03-01T08:00:00Z');
let ctx: PlansContext;
let id: (name: string) => string;
let jobs: TestJobs;

beforeAll(async () => {
  ({ ctx, id } = await setupPlansNetwork(NOW));
  jobs = await startTestJobs(ctx.config, { workers: true });
});
afterAll(async () => {
  await jobs.stop();
  await closePlansApp(ctx);
});

test('enqueue → the worker completes the run → accept → the window is planned', async () => {
  const windowId = await bookAssessed(ctx, 'p1 splice (worker flow)', '2028-01-11T22:00:00Z', '2028-01-12T02:00:00Z',
    [{ kind: 'span', id: id('p1'), effect: 'down' }]);
  const as = signedInRequests(ctx.makeApp({ now: () => NOW, jobs: jobs.jobs }), (role: 'planner') => ctx.users[role].email);
  const planner = await as('planner');

  const enqueued = await planner('post', `/api/windows/${windowId}/plans`).send({ seed: 3, timeLimitSeconds: 2 });
  expect(enqueued.status).toBe(202);
  const planId = planResponseSchema.parse(enqueued.body).plan.id;

  const seen = new Set<string>();
  let plan: Plan | null = null;
  for (const until = Date.now() + 60_000; Date.now() < until;) {
    plan = planResponseSchema.parse((await planner('get', `/api/plans/${planId}`)).body).plan;
    seen.add(plan.status);
    if (!['queued', 'running'].includes(plan.status)) break;
    await new Promise((r) => setTimeout(r, 100));
  }
  expect(plan?.status).toBe('done');
  expect(seen.has('running')).toBe(true);
  expect(plan?.attempts).toBe(1);
  // The window takes p1 down: S1's tie is rerouted over the backup span, nothing is left unresolved.
  const s1 = plan!.review!.slices.find((s) => s.slice === id('S1'));
  expect(s1?.outcome).toBe('reroute');
  expect(plan!.review!.totals.unresolved).toBe(0);

  const accepted = await planner('post', `/api/plans/${planId}/accept`).send({ outageAccepted: [] });
  expect(accepted.status).toBe(200);
  expect(planResponseSchema.parse(accepted.body).plan.accepted).toBe(true);
  expect(await windowRow(ctx, windowId)).toMatchObject({ status: 'planned', accepted_plan_id: planId });
});
