// The demo's window dates move by whole weeks to start 1–8 days after the seeding day.
import fc from 'fast-check';
import { windowShiftMs } from '../../db/seed/shift-windows';

const DAY_MS = 86_400_000;
const WEEK_MS = 7 * DAY_MS;
const instant = fc.integer({ min: Date.UTC(2000, 0, 1), max: Date.UTC(2100, 0, 1) });

test('the earliest window lands within days 1–8 after the start of the seeding day, by whole weeks', () => {
  fc.assert(fc.property(instant, instant, fc.integer({ min: 0, max: 40 * DAY_MS }), (earliestMs, nowMs, laterMs) => {
    const windows = [{ start: new Date(earliestMs + laterMs).toISOString() }, { start: new Date(earliestMs).toISOString() }];
    const shift = windowShiftMs(windows, new Date(nowMs));
    const dayStartMs = Math.floor(nowMs / DAY_MS) * DAY_MS;
    expect(Math.abs(shift % WEEK_MS)).toBe(0);
    expect(earliestMs + shift).toBeGreaterThanOrEqual(dayStartMs + DAY_MS);
    expect(earliestMs + shift).toBeLessThan(dayStartMs + 8 * DAY_MS);
  }));
});

test('the shift is the same at any time of one day', () => {
  fc.assert(fc.property(instant, instant, fc.integer({ min: 0, max: DAY_MS - 1 }), (earliestMs, nowMs, intoDayMs) => {
    const windows = [{ start: new Date(earliestMs).toISOString() }];
    const dayStartMs = Math.floor(nowMs / DAY_MS) * DAY_MS;
    expect(windowShiftMs(windows, new Date(dayStartMs + intoDayMs))).toBe(windowShiftMs(windows, new Date(dayStartMs)));
  }));
});

test('windows already 1–8 days ahead stay where they are, and no windows means no shift', () => {
  const now = new Date('2031-05-10T15:00:00Z');
  expect(windowShiftMs([{ start: '2031-05-13T22:00:00+02:00' }], now)).toBe(0);
  expect(windowShiftMs([], now)).toBe(0);
  // Two weeks back in the past: earliest 2031-04-30 22:00Z → +2 weeks = 2031-05-14 22:00Z (day 4).
  expect(windowShiftMs([{ start: '2031-05-01T00:00:00+02:00' }], now)).toBe(2 * WEEK_MS);
});
