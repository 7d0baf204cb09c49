// campaignIssues names every broken rule of a manual assignment in words, and nothing for a legal one.
import { campaignIssues } from '../../../planner/campaign/schedule-campaign';
import { nightlySlots, problem } from './campaign-fixtures';

describe('campaignIssues', () => {
  const slots = nightlySlots([1, 1, 1, 1, 1, 1, 1, 1, 1, 1]);
  const groups = [
    { slots, touched: ['s1'], label: 'North ring' },
    { slots, touched: ['s1', 's2'], label: 'Core upgrade' },
    { slots, touched: ['s3'] },
  ];

  it('a legal assignment, and one with everything unscheduled, have no issues', () => {
    expect(campaignIssues(problem(groups, 2, 3, [[0, 2]]), [0, 3, 1])).toEqual([]);
    expect(campaignIssues(problem(groups, 1, 9), [null, null, null])).toEqual([]);
  });

  it('names a night over the limit with its groups', () => {
    expect(campaignIssues(problem(groups, 2, 0), [4, 4, 4])).toEqual([
      'Sat 5 Dec 2026 holds 3 windows (North ring, Core upgrade and group 3); the campaign allows at most 2 a night.',
    ]);
  });

  it('names two groups touching a common slice too close together, with their nights and the gap in days', () => {
    expect(campaignIssues(problem(groups, 3, 7), [0, 2, null])).toEqual([
      'North ring (Tue 1 Dec 2026) and Core upgrade (Thu 3 Dec 2026) touch 1 common slice 2 days apart; '
        + 'a slice may be touched at most once in 7 days.',
    ]);
    expect(campaignIssues(problem(groups, 3, 7), [0, 7, null])).toEqual([]);
  });

  it('counts the spacing in calendar days, across a month and a year end', () => {
    const at = (night: string) => ({ startMs: Date.parse(`${night}T23:00:00Z`), endMs: Date.parse(`${night}T23:00:00Z`) + 3_600_000, night, cost: 1 });
    const p = problem([{ slots: [at('2026-12-31')], touched: ['s'] }, { slots: [at('2027-01-06'), at('2027-01-07')], touched: ['s'] }], 2, 7);
    expect(campaignIssues(p, [0, 0])).toEqual([
      'Group 1 (Thu 31 Dec 2026) and group 2 (Wed 6 Jan 2027) touch 1 common slice 6 days apart; a slice may be touched at most once in 7 days.',
    ]);
    expect(campaignIssues(p, [0, 1])).toEqual([]);
  });

  it('names clashing groups whose windows overlap', () => {
    expect(campaignIssues(problem(groups, 3, 0, [[1, 2]]), [null, 5, 5])).toEqual([
      'Core upgrade and group 3 must not be out at the same time, but their windows overlap (Sun 6 Dec 2026).',
    ]);
  });

  it('names a start that is not one of the group\'s usable ones, and a schedule of the wrong length', () => {
    const issues = campaignIssues(problem(groups, 3, 0), [10, -1, 0.5, 2]);
    expect(issues).toContain('The schedule lists 4 groups but the campaign has 3.');
    expect(issues).toContain('North ring is given a start that is not one of its 10 usable starts.');
    expect(issues).toContain('Core upgrade is given a start that is not one of its 10 usable starts.');
    expect(issues).toContain('Group 3 is given a start that is not one of its 10 usable starts.');
  });

  it('reports every broken rule at once', () => {
    expect(campaignIssues(problem(groups, 1, 5, [[0, 1]]), [0, 0, null])).toHaveLength(3);
  });
});
