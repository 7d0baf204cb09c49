// The slot finder's rules without a screen: ranked order, excluded slots grouped by reason in words, progress text,
// the booking form's pre-fill read back from the address, and the timing the form sends.
import { excludedGroups, noSlotReason, noticeText, progressText, rankedSlots, riskText, summaryText } from '@/components/slots/slot-words';
import { bookingHref, prefillFromParams } from '@/components/slots/slot-prefill';
import { rangeOf, validateTiming, type TimingValues } from '@/components/slots/timing-form-state';
import { validateSlotForm } from '@/components/slots/slot-form-state';
import { slotSearchSummarySchema } from '@/shared/slots';
import { candidate, excluded } from './slot-kit';

describe('ranked and excluded slots', () => {
  test('usable slots come in rank order whatever order the list arrives in; excluded ones are left out', () => {
    const list = [
      candidate({ rank: 3, start: '2030-01-09T01:00:00.000Z' }),
      excluded('FREEZE', '2030-01-08T01:00:00.000Z', 'Inside the freeze “Year end”.'),
      candidate({ rank: 1, start: '2030-01-12T01:00:00.000Z' }),
      candidate({ rank: 2, start: '2030-01-10T01:00:00.000Z' }),
    ];
    expect(rankedSlots(list).map((c) => c.rank)).toEqual([1, 2, 3]);
  });

  test('excluded slots group by reason in words, in the fixed reason order, each group by start', () => {
    const list = [
      excluded('LEAD_TIME', '2030-01-09T01:00:00.000Z', 'Harbour Health needs 7 days’ notice.'),
      excluded('CONFLICT', '2030-01-12T01:00:00.000Z', 'Shares Pellow Sands with “Rectifier swap”.'),
      excluded('FREEZE', '2030-01-11T01:00:00.000Z', 'Inside the freeze “Year end”.'),
      excluded('FREEZE', '2030-01-10T01:00:00.000Z', 'Inside the freeze “Year end”.'),
      candidate(),
    ];
    const groups = excludedGroups(list);
    expect(groups.map((g) => g.label)).toEqual(['Freeze', 'Conflicts with another window', 'Too late to give notice']);
    expect(groups[0].slots.map((c) => c.start)).toEqual(['2030-01-10T01:00:00.000Z', '2030-01-11T01:00:00.000Z']);
    expect(noSlotReason(list.slice(0, 4))).toBe(
      'Every possible slot is excluded: freeze (2 slots); conflicts with another window (1 slot); too late to give notice (1 slot).',
    );
  });

  test('figures carry their units and scale', () => {
    expect(riskText({ riskPercent: 0.4, riskLevel: 'Low' })).toBe('0.40 % (slices up to Low severity, on the slice severity scale)');
    expect(noticeText(6.57)).toBe('6.5 days to spare for notices');
    expect(noticeText(12.9)).toBe('12 days to spare for notices');
    expect(noticeText(0.4)).toBe('Notices must go out today');
    expect(noticeText(1)).toBe('1 day to spare for notices');
    expect(noticeText(-2)).toBe('2 days too late for a tenant’s notice');
    expect(noticeText(-0.5)).toBe('0.5 days too late for a tenant’s notice');
    expect(noticeText(null)).toBe('No tenant to notify');
  });

  test('the summary says how often the quick re-map ran and was reused, with units', () => {
    expect(summaryText({ usable: 100, excluded: 5, remapRuns: 12, reusedRuns: 80, elapsedMs: 4321, remapLimitMs: 300, remapsCutShort: 0 }))
      .toBe('105 slots checked in 4.3 s. The quick re-map ran 12 times (at most 300 ms each) and reused an earlier run for 80 slots on the same network state.');
    expect(summaryText({ usable: 24, excluded: 21, remapRuns: 0, reusedRuns: 24, elapsedMs: 100, remapLimitMs: 300, remapsCutShort: 0 }))
      .toBe('45 slots checked in 0.1 s. The quick re-map reused an earlier run for 24 slots on the same network state.');
    expect(summaryText({ usable: 1, excluded: 0, remapRuns: 1, reusedRuns: 0, elapsedMs: 800, remapLimitMs: 300, remapsCutShort: 0 }))
      .toBe('1 slot checked in 0.8 s. The quick re-map ran 1 time (at most 300 ms each).');
  });

  test('re-maps the time cap cut short are said, with the cap and what it means for the ranking', () => {
    const base = { usable: 20, excluded: 1, remapRuns: 5, reusedRuns: 16, elapsedMs: 9000, remapLimitMs: 900 };
    expect(summaryText({ ...base, remapsCutShort: 3 })).toBe('21 slots checked in 9.0 s. The quick re-map ran 5 times '
      + '(at most 900 ms each) and reused an earlier run for 16 slots on the same network state. 3 re-maps hit the time cap '
      + 'of 900 ms; their slots may rank differently on another run.');
    expect(summaryText({ ...base, remapsCutShort: 1 })).toMatch(/ 1 re-map hit the time cap of 900 ms; its slots may rank differently on another run\.$/);
    expect(summaryText({ ...base, remapsCutShort: 0 })).not.toMatch(/time cap/);
  });

  test('a summary stored before cut-short re-maps were counted reads as none cut short', () => {
    const stored = slotSearchSummarySchema.parse({ usable: 2, excluded: 0, remapRuns: 1, reusedRuns: 1, elapsedMs: 500, remapLimitMs: 300 });
    expect(stored.remapsCutShort).toBe(0);
    expect(summaryText(stored)).not.toMatch(/time cap/);
  });

  test('progress reads "N of M slots checked"; before counting it says it is getting ready', () => {
    expect(progressText({ phase: 'evaluating', done: 12, total: 105, elapsedMs: 2300 })).toBe('12 of 105 slots checked');
    expect(progressText({ phase: 'evaluating', done: 1, total: 4, elapsedMs: 0 }, 'groups')).toBe('1 of 4 groups checked');
    expect(progressText(null)).toBe('Getting ready…');
    expect(progressText({ phase: 'scheduling', done: 0, total: 40, elapsedMs: 0 }, 'groups')).toBe('Choosing nights: 0 % of the search done');
    expect(progressText({ phase: 'scheduling', done: 37_500, total: 100_000, elapsedMs: 900 }, 'groups')).toBe('Choosing nights: 37 % of the search done');
  });
});

describe('booking from a slot', () => {
  test('the address carries the slot, and the form reads it back in the viewer’s zone with the elements taken out', () => {
    const href = bookingHref({ start: '2030-01-10T01:00:00.000Z', end: '2030-01-10T05:00:00.000Z', sites: ['cell-a', 'cell-b'], spans: ['span-x'] });
    const query = Object.fromEntries(new URLSearchParams(href.split('?')[1]));
    expect(href.startsWith('/windows/new?')).toBe(true);
    const values = prefillFromParams(query, 'Europe/Oslo');
    expect(values).toMatchObject({ startDate: '2030-01-10', startTime: '02:00', endDate: '2030-01-10', endTime: '06:00', title: '' });
    expect(values?.elements.map((e) => `${e.kind}:${e.id}:${e.effect}`)).toEqual(['site:cell-a:down', 'site:cell-b:down', 'span:span-x:down']);
  });

  test('an address without a usable slot fills nothing', () => {
    expect(prefillFromParams({}, 'UTC')).toBeNull();
    expect(prefillFromParams({ start: 'tomorrow', end: '2030-01-10T05:00:00.000Z' }, 'UTC')).toBeNull();
    expect(prefillFromParams({ start: '2030-01-10T05:00:00.000Z', end: '2030-01-10T01:00:00.000Z' }, 'UTC')).toBeNull();
  });
});

describe('the timing the form sends', () => {
  const base: TimingValues = { durationText: '4', fromDate: '2030-01-08', toDate: '2030-01-28', hoursStart: '00:00', hoursEnd: '05:00', weekdays: [1, 2, 3, 4, 5, 6, 7] };

  test('the range runs from the first night’s allowed start to the last night’s allowed end, in the network’s zone (UTC−1)', () => {
    expect(rangeOf('2030-01-08', '2030-01-28', { start: '00:00', end: '05:00' })).toEqual({ from: '2030-01-08T01:00:00.000Z', to: '2030-01-28T06:00:00.000Z' });
    expect(rangeOf('2030-01-08', '2030-01-08', { start: '22:00', end: '05:00' })).toEqual({ from: '2030-01-08T23:00:00.000Z', to: '2030-01-09T06:00:00.000Z' });
  });

  test('all seven nights send no weekday filter; fewer send them sorted', () => {
    expect(validateTiming(base).output?.weekdays).toBeUndefined();
    expect(validateTiming({ ...base, weekdays: [5, 1, 3] }).output?.weekdays).toEqual([1, 3, 5]);
  });

  test('each broken field says what to do', () => {
    const { errors, output } = validateTiming({ ...base, durationText: 'four', toDate: '2030-01-01', weekdays: [] });
    expect(output).toBeNull();
    expect(errors.duration).toMatch(/hours the work takes/);
    expect(errors.to).toBe('The last night must be on or after the first.');
    expect(errors.weekdays).toBe('Pick at least one day of the week.');
    expect(validateTiming({ ...base, durationText: '6' }).errors.duration).toMatch(/do not fit in the allowed hours/);
  });

  test('the slot form needs a site or span and splits them by kind', () => {
    expect(validateSlotForm({ ...base, elements: [] }).errors.elements).toMatch(/at least one site or span/);
    const { output } = validateSlotForm({ ...base, elements: [{ kind: 'span', id: 'span-x', label: 'A – B' }, { kind: 'site', id: 'cell-a', label: 'A' }] });
    expect(output).toMatchObject({ sites: ['cell-a'], spans: ['span-x'], durationHours: 4, hours: { start: '00:00', end: '05:00' }, stepMinutes: 60 });
  });
});
