// A campaign group the slot finder leaves no usable start says why, from the finder's own exclusions.
import { noUsableStartReason } from '../../../server/services/campaigns/plan-campaign';
import type { SlotCandidate } from '../../../shared/slots';

function excluded(code: NonNullable<SlotCandidate['excluded']>['code'], reason: string): SlotCandidate {
  return {
    start: '2031-01-01T01:00:00.000Z', end: '2031-01-01T05:00:00.000Z', night: '2031-01-01', rank: null, excluded: { code, reason },
    touched: 3, unresolved: null, criticalTouched: 1, criticalUnresolved: null,
    counts: { touched: 3, mustMove: 3, protectionLost: 0, unresolved: null, knockOn: null },
    riskPercent: 0, riskLevel: 'Low', overlapping: [], conflicts: [], noticeSpareDays: 5, cost: 20, reused: false, explanation: '',
  };
}

test('the commonest exclusion comes first, with counts of each and one reason in full', () => {
  const reason = noUsableStartReason([
    excluded('FREEZE', 'Inside the freeze "Year end".'),
    excluded('CRITICAL_STRANDED', 'The quick re-map finds no place for the critical slice "Ambulance dispatch".'),
    excluded('CRITICAL_STRANDED', 'The quick re-map finds no place for the critical slice "Ambulance dispatch".'),
  ]);
  expect(reason).toBe('No usable start in the range (3 checked): 2 cutting off a critical slice, 1 inside a freeze. '
    + 'For example: The quick re-map finds no place for the critical slice "Ambulance dispatch".');
});

test('with nothing excluded (no start at all) it says only that', () => {
  expect(noUsableStartReason([])).toBe('It has no usable start in the range.');
});
