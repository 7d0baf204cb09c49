// Time-zone helpers: one instant in two zones, windows across midnight, and daylight-saving change days.
// Zone rules checked against (memory, well-known civil rules): Central European Time is UTC+1 in winter and
// UTC+2 in summer, the change in the EU on the last Sunday of March at 01:00 UTC (2027-03-28) and back on the
// last Sunday of October (2027-10-31); US Eastern is UTC−5/−4, changing on the second Sunday of March at
// 02:00 local (2027-03-14).
import fc from 'fast-check';
import {
  dayKeyAt,
  dayLengthHours,
  formatDuration,
  formatInstant,
  formatWindowRange,
  overlapsDay,
  splitIntoDaySegments,
  startOfDayMs,
  visibleDays,
  visibleRange,
  zoneName,
} from '@/components/time';

const BERLIN = 'Europe/Berlin';
const NEW_YORK = 'America/New_York';
const HOUR_MS = 3_600_000;

describe('one instant, two zones', () => {
  test('22:00 UTC on 3 Dec is 23:00 CET in Berlin and 17:00 EST in New York, each zone named', () => {
    const iso = '2026-12-03T22:00:00.000Z';
    expect(formatInstant(iso, BERLIN)).toBe('Thu 3 Dec, 23:00 CET');
    expect(formatInstant(iso, NEW_YORK)).toBe('Thu 3 Dec, 17:00 EST');
  });

  test('a window booked with an offset shows the same instant in another zone', () => {
    // Booked as 22:00 at UTC−1 (the demo coast's zone) = 23:00 UTC = midnight in Berlin.
    const startsAt = new Date('2026-12-03T22:00:00-01:00').toISOString();
    const endsAt = new Date('2026-12-04T02:00:00-01:00').toISOString();
    expect(formatWindowRange(startsAt, endsAt, BERLIN)).toBe('Fri 4 Dec, 00:00 – 04:00 CET');
    expect(formatWindowRange(startsAt, endsAt, NEW_YORK)).toBe('Thu 3 Dec, 18:00 – 22:00 EST');
    expect(formatWindowRange(startsAt, endsAt, 'UTC')).toBe('Thu 3 Dec, 23:00 – Fri 4 Dec, 03:00 UTC');
  });

  test('zones without a common abbreviation are named by their offset', () => {
    expect(zoneName('2026-12-03T22:00:00Z', 'Asia/Kolkata')).toBe('GMT+5:30');
  });
});

describe('a window crossing midnight', () => {
  const startsAt = '2026-12-03T22:00:00.000Z'; // 23:00 CET
  const endsAt = '2026-12-04T02:00:00.000Z'; // 03:00 CET

  test('is split into two day segments in Berlin: one hour on the 3rd, three on the 4th', () => {
    const segments = splitIntoDaySegments(startsAt, endsAt, BERLIN);
    expect(segments.map((s) => [s.day, s.durationMs / HOUR_MS, s.isFirst, s.isLast])).toEqual([
      ['2026-12-03', 1, true, false],
      ['2026-12-04', 3, false, true],
    ]);
    expect(formatWindowRange(startsAt, endsAt, BERLIN)).toBe('Thu 3 Dec, 23:00 – Fri 4 Dec, 03:00 CET');
  });

  test('stays on one day in New York, where it runs 17:00–21:00', () => {
    expect(splitIntoDaySegments(startsAt, endsAt, NEW_YORK).map((s) => s.day)).toEqual(['2026-12-03']);
  });

  test('overlaps both days, and an end exactly at midnight adds no empty day', () => {
    expect(overlapsDay(startsAt, endsAt, '2026-12-03', BERLIN)).toBe(true);
    expect(overlapsDay(startsAt, endsAt, '2026-12-04', BERLIN)).toBe(true);
    expect(overlapsDay(startsAt, endsAt, '2026-12-05', BERLIN)).toBe(false);
    const untilMidnight = splitIntoDaySegments('2026-12-03T20:00:00Z', '2026-12-03T23:00:00Z', BERLIN);
    expect(untilMidnight.map((s) => s.day)).toEqual(['2026-12-03']);
    expect(overlapsDay('2026-12-03T20:00:00Z', '2026-12-03T23:00:00Z', '2026-12-04', BERLIN)).toBe(false);
  });
});

describe('daylight-saving change days', () => {
  test('Berlin 2027-03-28 has 23 hours; 01:00 CET to 04:00 CEST lasts two hours, both zones named', () => {
    expect(dayLengthHours('2027-03-28', BERLIN)).toBe(23);
    const startsAt = '2027-03-28T00:00:00.000Z';
    const endsAt = '2027-03-28T02:00:00.000Z';
    const [segment] = splitIntoDaySegments(startsAt, endsAt, BERLIN);
    expect(segment.durationMs).toBe(2 * HOUR_MS);
    expect(formatWindowRange(startsAt, endsAt, BERLIN)).toBe('Sun 28 Mar, 01:00 CET – 04:00 CEST');
    expect(formatDuration(segment.durationMs)).toBe('2 h');
    expect(formatDuration(90 * 60_000)).toBe('1 h 30 min');
    expect(formatDuration(74 * HOUR_MS)).toBe('3 d 2 h');
  });

  test('Berlin 2027-10-31 has 25 hours', () => {
    expect(dayLengthHours('2027-10-31', BERLIN)).toBe(25);
    expect(dayLengthHours('2027-10-30', BERLIN)).toBe(24);
  });

  test('New York 2027-03-14 has 23 hours; a night window over the change is split by true durations', () => {
    expect(dayLengthHours('2027-03-14', NEW_YORK)).toBe(23);
    expect(new Date(startOfDayMs('2027-03-14', NEW_YORK)).toISOString()).toBe('2027-03-14T05:00:00.000Z');
    // 23:00 EST on the 13th to 03:00 EDT on the 14th: four wall-clock hours, three real ones.
    const startsAt = '2027-03-14T04:00:00.000Z';
    const endsAt = '2027-03-14T07:00:00.000Z';
    const segments = splitIntoDaySegments(startsAt, endsAt, NEW_YORK);
    expect(segments.map((s) => [s.day, s.durationMs / HOUR_MS])).toEqual([
      ['2027-03-13', 1],
      ['2027-03-14', 2],
    ]);
    expect(formatWindowRange(startsAt, endsAt, NEW_YORK)).toBe('Sat 13 Mar, 23:00 EST – Sun 14 Mar, 03:00 EDT');
  });
});

test('where a zone skips midnight (Havana, 2027-03-14: 00:00 → 01:00), the day starts at its first real minute', () => {
  // Zone rule observed in this runtime's ICU data (secondary): Cuba changes at local midnight.
  expect(new Date(startOfDayMs('2027-03-14', 'America/Havana')).toISOString()).toBe('2027-03-14T05:00:00.000Z');
  expect(dayLengthHours('2027-03-14', 'America/Havana')).toBe(23);
});

describe('day segments, for any window in any of several zones', () => {
  const zones = [BERLIN, NEW_YORK, 'UTC', 'Asia/Kolkata', 'Australia/Lord_Howe', 'Pacific/Chatham', 'America/Havana', 'America/Santiago'];
  // 2026-01-01 .. 2028-01-01, windows up to 4 days long.
  const instantMs = fc.integer({ min: Date.UTC(2026, 0, 1), max: Date.UTC(2028, 0, 1) });
  const lengthMs = fc.integer({ min: 60_000, max: 4 * 24 * HOUR_MS });

  test('are contiguous, each inside its own day, and add up to the window measured between instants', () => {
    fc.assert(
      fc.property(fc.constantFrom(...zones), instantMs, lengthMs, (zone, startMs, durationMs) => {
        const startsAt = new Date(startMs).toISOString();
        const endsAt = new Date(startMs + durationMs).toISOString();
        const segments = splitIntoDaySegments(startsAt, endsAt, zone);
        expect(segments[0].startMs).toBe(startMs);
        expect(segments[segments.length - 1].endMs).toBe(startMs + durationMs);
        expect(segments.reduce((sum, s) => sum + s.durationMs, 0)).toBe(durationMs);
        segments.forEach((segment, index) => {
          if (index > 0) expect(segment.startMs).toBe(segments[index - 1].endMs);
          expect(dayKeyAt(segment.startMs, zone)).toBe(segment.day);
          expect(dayKeyAt(segment.endMs - 1, zone)).toBe(segment.day);
        });
      }),
      { numRuns: 150 },
    );
  });
});

describe('the month grid', () => {
  test('December 2026 shows Mon 30 Nov to Sun 3 Jan, asked for in UTC instants of the zone', () => {
    expect(visibleDays('2026-12')).toEqual({ firstDay: '2026-11-30', lastDay: '2027-01-03' });
    expect(visibleRange('2026-12', BERLIN)).toEqual({ from: '2026-11-29T23:00:00.000Z', to: '2027-01-03T23:00:00.000Z' });
  });

  test('a month starting on Monday has no leading days (March 2027)', () => {
    expect(visibleDays('2027-03').firstDay).toBe('2027-03-01');
  });
});
