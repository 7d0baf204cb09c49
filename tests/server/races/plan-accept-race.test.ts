// Accepting plans of one window in parallel: the first run accepted wins, a repeat of it answers the same without
// changing anything, and another run is refused (PLAN_ALREADY_ACCEPTED) unless it names the plan it replaces.
import { planResponseSchema } from '../../../shared/plans';
import { bookAssessed, closePlansApp, setupPlansNetwork, storeFinishedPlan, windowRow, type PlansContext } from '../plans/helpers';

// This file books in March 2028 only (other plan suites share the scratch database and hold capacity elsewhere).
const NOW = new Date('2027-03-01T08:00:00Z');
let ctx: PlansContext;
let id: (name: string) => string;

beforeAll(async () => ({ ctx, id } = await setupPlansNetwork(NOW)));
afterAll(() => closePlansApp(ctx));

const day = (d: number) => [`2028-03-${String(d).padStart(2, '0')}T22:00:00Z`, `2028-03-${String(d + 1).padStart(2, '0')}T02:00:00Z`] as const;
const p1Down = () => [{ kind: 'span' as const, id: id('p1'), effect: 'down' as const }];

async function twoRuns(title: string, d: number) {
  const w = await bookAssessed(ctx, title, ...day(d), p1Down());
  const a = (await storeFinishedPlan(ctx, w)).planId;
  const b = (await storeFinishedPlan(ctx, w)).planId;
  return { w, a, b };
}

async function acceptAudits(ids: string[]) {
  const res = await ctx.pool.query(`select entity from audit_log where action = 'plan.accept' and entity_id = any($1)`, [ids]);
  return res.rows.map((r) => r.entity as string).sort();
}

const acceptedAt = async (planId: string) =>
  (await ctx.pool.query('select accepted_at from plans where id = $1', [planId])).rows[0].accepted_at as Date | null;

test('four parallel accepts of two runs: one run wins (both its answers 200), the other is refused twice', async () => {
  const { w, a, b } = await twoRuns('race', 3);
  const before = await windowRow(ctx, w);
  const planner = await ctx.as('planner');
  const order = [a, b, a, b];
  const answers = await Promise.all(order.map((p) => planner('post', `/api/plans/${p}/accept`).send({})));
  const winner = (await windowRow(ctx, w)).accepted_plan_id;
  expect([a, b]).toContain(winner);
  const loser = winner === a ? b : a;
  answers.forEach((res, i) => {
    if (order[i] === winner) {
      expect(res.status).toBe(200);
      expect(planResponseSchema.parse(res.body).plan).toMatchObject({ id: winner, accepted: true });
    } else {
      expect([res.status, res.body.error.code]).toEqual([409, 'PLAN_ALREADY_ACCEPTED']);
      expect(res.body.error.message).toContain(winner);
    }
  });
  expect(await windowRow(ctx, w)).toEqual({ status: 'planned', version: before.version + 1, accepted_plan_id: winner });
  expect(await acceptAudits([w, a, b])).toEqual(['plan', 'window']);
  expect(await acceptedAt(loser)).toBeNull();
});

test('accepting the accepted run again answers 200 and changes nothing', async () => {
  const { w, a } = await twoRuns('repeat', 6);
  const planner = await ctx.as('planner');
  const first = await planner('post', `/api/plans/${a}/accept`).send({});
  expect(first.status).toBe(200);
  const row = await windowRow(ctx, w);
  const again = await planner('post', `/api/plans/${a}/accept`).send({});
  expect(again.status).toBe(200);
  expect(again.body).toEqual(first.body);
  expect(await windowRow(ctx, w)).toEqual(row);
  expect(await acceptAudits([w, a])).toEqual(['plan', 'window']);
});

test('another run replaces the accepted one only when the request names it', async () => {
  const { w, a, b } = await twoRuns('replace', 9);
  const planner = await ctx.as('planner');
  expect((await planner('post', `/api/plans/${a}/accept`).send({})).status).toBe(200);
  const wrong = await planner('post', `/api/plans/${b}/accept`).send({ replacesPlanId: b });
  expect([wrong.status, wrong.body.error.code]).toEqual([409, 'PLAN_ALREADY_ACCEPTED']);
  expect((await windowRow(ctx, w)).accepted_plan_id).toBe(a);
  const replaced = await planner('post', `/api/plans/${b}/accept`).send({ replacesPlanId: a });
  expect(replaced.status).toBe(200);
  expect(replaced.body.plan).toMatchObject({ id: b, accepted: true });
  expect((await windowRow(ctx, w)).accepted_plan_id).toBe(b);
  expect((await planner('get', `/api/plans/${a}`)).body.plan.accepted).toBe(false);
});
