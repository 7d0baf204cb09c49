// Hand-reasoned campaigns: where the optimum is known, the scheduler finds it; where a group cannot go in, it says why.
import { bruteForceCampaign } from '../../../planner/campaign/brute-force';
import { campaignCost, campaignIssues, scheduleCampaign, UNSCHEDULED_PENALTY } from '../../../planner/campaign/schedule-campaign';
import { InvalidOptionError } from '../../../planner/errors';
import { dayGap, nightlySlots, problem } from './campaign-fixtures';

const flat = (n: number, cost = 10) => Array.from({ length: n }, () => cost);

describe('scheduleCampaign on problems solved by hand', () => {
  it('two groups sharing a slice, 7 days apart, 10 nights: both scheduled at least 7 days apart', () => {
    const p = problem([{ slots: nightlySlots(flat(10)), touched: ['s1'] }, { slots: nightlySlots(flat(10)), touched: ['s1', 's2'] }], 2, 7);
    const r = scheduleCampaign(p, { seed: 3 });
    expect(r.assignment.every((s) => s !== null)).toBe(true);
    const [a, b] = r.assignment.map((s, g) => p.groups[g].slots[s as number].night);
    expect(dayGap(a, b)).toBeGreaterThanOrEqual(7);
    expect(r.totalCost).toBe(20);
    expect(campaignIssues(p, r.assignment)).toEqual([]);
  });

  it('the cheap nights go to the group that cannot use the others: the search beats a greedy start', () => {
    // Group 1 (more slots, placed second) grabs night 0 cheaply in a greedy order only if free; the optimum puts
    // group 0 on its only night and group 1 on its second-best one, 7 days later.
    const p = problem([
      { slots: nightlySlots([5]), touched: ['s'] },
      { slots: nightlySlots([1, 50, 50, 50, 50, 50, 50, 20]), touched: ['s'] },
    ], 1, 7);
    const r = scheduleCampaign(p);
    expect(r.assignment).toEqual([0, 7]);
    expect(r.totalCost).toBe(25);
  });

  it('maxPerNight 1, three groups, two nights: one group stays unscheduled and the reason names the full nights', () => {
    const p = problem([0, 1, 2].map(() => ({ slots: nightlySlots([10, 20]), touched: [] })), 1, 0);
    const r = scheduleCampaign(p, { seed: 9 });
    expect(r.assignment.filter((s) => s === null)).toHaveLength(1);
    const g = r.assignment.indexOf(null);
    expect(r.unscheduledReasons[g]).toMatch(/nights that already hold 1 window/);
    expect(r.unscheduledReasons[g]).toMatch(/Tue 1 Dec 2026 and Wed 2 Dec 2026/);
    expect(r.unscheduledReasons.filter((x) => x === null)).toHaveLength(2);
    expect(r.totalCost).toBe(30 + UNSCHEDULED_PENALTY);
    expect(r.windowsCost).toBe(30);
  });

  it('the reason for an unscheduled group names the groups that block it, by label', () => {
    const p = problem([
      { slots: nightlySlots([1, 1]), touched: ['s'], label: 'North ring' },
      { slots: nightlySlots([1, 1]), touched: ['s'], label: 'Core upgrade' },
    ], 3, 5);
    const r = scheduleCampaign(p);
    const g = r.assignment.indexOf(null);
    expect(g).toBeGreaterThanOrEqual(0);
    expect(r.unscheduledReasons[g]).toContain(`within 5 days of a window touching the same slices (${p.groups[1 - g].label})`);
  });

  it('a reason names at most 5 nights and counts the rest', () => {
    const p = problem([0, 1, 2, 3, 4, 5, 6, 7].map(() => ({ slots: nightlySlots(flat(7)), touched: [] })), 1, 0);
    const r = scheduleCampaign(p);
    const g = r.assignment.indexOf(null);
    expect(r.unscheduledReasons[g]).toContain('(Tue 1 Dec 2026, Wed 2 Dec 2026, Thu 3 Dec 2026, Fri 4 Dec 2026, Sat 5 Dec 2026 and 2 more nights)');
  });

  it('clashing groups never overlap; non-clashing ones may share a night', () => {
    const slots = nightlySlots([1, 9]);
    const p = problem([{ slots, touched: [] }, { slots, touched: [] }, { slots, touched: [] }], 3, 0, [[0, 1]]);
    const r = scheduleCampaign(p);
    expect(r.assignment[0]).not.toBe(r.assignment[1]);
    expect(r.assignment[2]).toBe(0);
    expect(r.totalCost).toBe(11);
  });

  it('an insertion moves the one group blocking the only night left (ejection chain of depth 1)', () => {
    // The constructive start places "A" first (same slot count, more slices) on its cheap night 0; both of B's
    // starts are on night 0, which is then full. Moving A to night 1 lets B in.
    const p = problem([
      { slots: nightlySlots([1, 5]), touched: ['s1', 's2'], label: 'A' },
      { slots: [...nightlySlots([1]), ...nightlySlots([2], { startHour: 21, hours: 1 })], touched: ['s3'], label: 'B' },
    ], 1, 0);
    const r = scheduleCampaign(p);
    expect(r.startCost).toBe(1 + UNSCHEDULED_PENALTY);
    expect(r).toMatchObject({ startWindowsCost: 1, startUnscheduled: 1, windowsCost: 6 });
    expect(r.assignment).toEqual([1, 0]);
    expect(r.totalCost).toBe(6);
    expect(r.moves).toBeGreaterThanOrEqual(1);
  });

  it('a group without usable slots says so and costs the penalty', () => {
    const p = problem([{ slots: [], touched: ['s'] }, { slots: nightlySlots([4]), touched: ['s'] }], 1, 0);
    const r = scheduleCampaign(p);
    expect(r.assignment).toEqual([null, 0]);
    expect(r.unscheduledReasons[0]).toMatch(/no usable start/);
    expect(r.totalCost).toBe(UNSCHEDULED_PENALTY + 4);
  });

  it('the same seed gives the same schedule; progress ends at the total', () => {
    const p = problem(Array.from({ length: 8 }, (_, i) => ({ slots: nightlySlots([3, 1, 4, 1, 5, 9, 2, 6].map((c) => (c * (i + 1)) % 7)), touched: [`s${i % 3}`] })), 2, 3);
    const calls: Array<[number, number]> = [];
    const a = scheduleCampaign(p, { seed: 5, maxIterations: 3000, onProgress: (d, t) => calls.push([d, t]) });
    const b = scheduleCampaign(p, { seed: 5, maxIterations: 3000 });
    expect(b).toEqual(a);
    expect(calls[calls.length - 1][1]).toBe(3000);
    expect(calls[calls.length - 1][0]).toBe(a.iterations);
    expect(a.iterations).toBeLessThanOrEqual(3000);
    expect(a.totalCost).toBe(bruteForceCampaign(p).cost);
  });

  it('with no search budget the constructive start is the answer', () => {
    const p = problem([
      { slots: nightlySlots([1, 5]), touched: ['s1', 's2'] },
      { slots: [...nightlySlots([1]), ...nightlySlots([2], { startHour: 21, hours: 1 })], touched: ['s3'] },
    ], 1, 0);
    const r = scheduleCampaign(p, { maxIterations: 0 });
    expect(r).toMatchObject({ assignment: [0, null], iterations: 0, moves: 0, totalCost: r.startCost });
    expect(r.startCost).toBe(1 + UNSCHEDULED_PENALTY);
  });

  it('rejects rules and budgets outside their range and clashes naming no group', () => {
    expect(() => scheduleCampaign(problem([], 0, 0))).toThrow(InvalidOptionError);
    expect(() => scheduleCampaign(problem([], 1, -1))).toThrow(InvalidOptionError);
    expect(() => scheduleCampaign(problem([], 1, 0), { maxIterations: Number.NaN })).toThrow(InvalidOptionError);
    expect(() => scheduleCampaign(problem([], 1, 0), { maxIterations: -5 })).toThrow(InvalidOptionError);
    expect(() => scheduleCampaign(problem([{ slots: [], touched: [] }], 1, 0, [[0, 3]]))).toThrow(InvalidOptionError);
    expect(() => scheduleCampaign(problem([{ slots: [{ startMs: 0, endMs: 1, night: '1 Dec', cost: 0 }], touched: [] }], 1, 0)))
      .toThrow(InvalidOptionError);
  });

  it('campaignCost adds the penalty per unscheduled group to the windows\' costs', () => {
    const p = problem([{ slots: nightlySlots([2, 3]), touched: [] }, { slots: nightlySlots([7]), touched: [] }], 1, 0);
    expect(campaignCost(p, [1, null])).toBe(3 + UNSCHEDULED_PENALTY);
    expect(campaignCost(p, [1, 0])).toBe(10);
  });
});
