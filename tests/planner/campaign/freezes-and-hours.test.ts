// "Respects freezes and allowed hours": slot options are built the way the campaign job builds them (every start
// of shared/slot-times.ts in the network's zone, less those a freeze overlaps), and every scheduled window is then
// checked against the allowed hours of its night on the zone's wall clock and against every freeze.
import fc from 'fast-check';
import { scheduleCampaign, type CampaignGroupInput } from '../../../planner/campaign/schedule-campaign';
import { createRng, randomInt } from '../../../planner/random/rng';
import { slotTimes, type SlotTiming } from '../../../shared/slot-times';
import { NETWORK_TIME_ZONE } from '../../../shared/time-zone';
import { dayKeyAt, wallClockAt } from '../../../shared/zone-clock';

const HOUR_MS = 3_600_000;
const hhmm = (minutes: number) => `${String(Math.floor(minutes / 60)).padStart(2, '0')}:${String(minutes % 60).padStart(2, '0')}`;

interface Case { timing: SlotTiming; freezes: Array<{ startMs: number; endMs: number }>; groups: CampaignGroupInput[]; maxPerNight: number; days: number }

const caseArb: fc.Arbitrary<Case> = fc.record({
  startHalfHours: fc.integer({ min: 0, max: 47 }),
  endHalfHours: fc.integer({ min: 0, max: 47 }),
  durationHours: fc.integer({ min: 1, max: 6 }),
  fromDay: fc.integer({ min: 0, max: 20 }),
  rangeDays: fc.integer({ min: 3, max: 21 }),
  step: fc.constantFrom(30 as const, 60 as const),
  weekdays: fc.option(fc.uniqueArray(fc.integer({ min: 1, max: 7 }), { minLength: 1, maxLength: 7 }), { nil: undefined }),
  freezes: fc.array(fc.record({ atHours: fc.integer({ min: 0, max: 21 * 24 }), lengthHours: fc.integer({ min: 1, max: 72 }) }), { maxLength: 4 }),
  groupCount: fc.integer({ min: 3, max: 12 }),
  seed: fc.integer({ min: 0, max: 1_000_000 }),
  maxPerNight: fc.integer({ min: 1, max: 4 }),
  days: fc.integer({ min: 0, max: 10 }),
}).map((c) => {
  const fromMs = Date.UTC(2026, 11, 1 + c.fromDay);
  const timing: SlotTiming = {
    from: new Date(fromMs).toISOString(), to: new Date(fromMs + c.rangeDays * 24 * HOUR_MS).toISOString(),
    hours: { start: hhmm(c.startHalfHours * 30), end: hhmm(c.endHalfHours * 30) }, durationHours: c.durationHours, stepMinutes: c.step,
    weekdays: c.weekdays,
  };
  const freezes = c.freezes.map((f) => ({ startMs: fromMs + f.atHours * HOUR_MS, endMs: fromMs + (f.atHours + f.lengthHours) * HOUR_MS }));
  const usable = slotTimes(timing, NETWORK_TIME_ZONE).filter((t) => !freezes.some((f) => t.startMs < f.endMs && f.startMs < t.endMs));
  const rng = createRng(c.seed);
  const groups = Array.from({ length: c.groupCount }, () => ({
    slots: usable.filter(() => rng() < 0.6).map((t) => ({ ...t, cost: randomInt(rng, 200) })),
    touched: ['s1', 's2', 's3', 's4'].filter(() => rng() < 0.4),
  }));
  return { timing, freezes, groups, maxPerNight: c.maxPerNight, days: c.days };
});

/** Minutes from the start of `night` (local midnight) to `instantMs`, read off the zone's wall clock. */
function minutesIntoNight(instantMs: number, night: string): number {
  const clock = wallClockAt(instantMs, NETWORK_TIME_ZONE);
  const daysLater = (Date.parse(dayKeyAt(instantMs, NETWORK_TIME_ZONE)) - Date.parse(night)) / 86_400_000;
  return daysLater * 24 * 60 + clock.hour * 60 + clock.minute;
}

describe('campaign schedules built from real slot times', () => {
  it('respects freezes and allowed hours: every window lies inside its night\'s allowed hours and days and overlaps no freeze', () => {
    let windows = 0;
    fc.assert(fc.property(caseArb, ({ timing, freezes, groups, maxPerNight, days }) => {
      const p = { groups, rules: { maxPerNight, minDaysBetweenTouches: days }, clashes: [] };
      const r = scheduleCampaign(p, { seed: 1, maxIterations: 3000 });
      const [sh, sm] = timing.hours.start.split(':').map(Number);
      const [eh, em] = timing.hours.end.split(':').map(Number);
      const allowedStart = sh * 60 + sm;
      const allowedEnd = eh * 60 + em > allowedStart ? eh * 60 + em : eh * 60 + em + 24 * 60;
      r.assignment.forEach((s, g) => {
        if (s === null) return;
        windows++;
        const w = groups[g].slots[s];
        expect(minutesIntoNight(w.startMs, w.night)).toBeGreaterThanOrEqual(allowedStart);
        expect(minutesIntoNight(w.endMs, w.night)).toBeLessThanOrEqual(allowedEnd);
        expect(w.endMs - w.startMs).toBe(timing.durationHours * 3_600_000);
        for (const f of freezes) expect(w.startMs < f.endMs && f.startMs < w.endMs).toBe(false);
        // the allowed period begins on one of the allowed weekdays (ISO: 1 Monday … 7 Sunday)
        if (timing.weekdays) expect(timing.weekdays).toContain(new Date(`${w.night}T12:00:00Z`).getUTCDay() || 7);
      });
    }), { numRuns: 60, seed: 8_052_026 });
    // the property is about windows: make sure the generator gives it plenty to check
    expect(windows).toBeGreaterThan(100);
  });
});
