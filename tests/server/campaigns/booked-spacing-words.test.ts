// The words a campaign group gets when windows booked elsewhere rule out its starts: names, never ids.
import {
  bookedSpacingNote, bookedSpacingReason, keepSpacedFromBooked, type BookedTouch,
} from '../../../server/services/campaigns/booked-spacing';
import { dayNumber } from '../../../planner/campaign/compile-campaign';
import type { SlotNames } from '../../../server/services/slots/slot-words';

const SLICES: Record<string, string> = { s1: 'Harbour CCTV', s2: 'Port telemetry', s3: 'Ferry ticketing' };
const names: SlotNames = { site: (id) => id, span: (id) => id, slice: (id) => SLICES[id], tenant: (id) => id };
const window = (title: string, night: string, slices: string[]): BookedTouch => ({
  title, firstDay: dayNumber(night), lastDay: dayNumber(night), slices: new Set(slices),
});
const nights = (...list: string[]) => list.map((night) => ({ night }));

test('one window: each start near it, named with the slice it shares', () => {
  const duct = window('Duct repair in the shared trench', '2030-03-10', ['s1', 's3']);
  const spaced = keepSpacedFromBooked(nights('2030-03-08', '2030-03-12'), ['s1', 's2'], [duct], 7);
  expect(spaced.kept).toEqual([]);
  expect(bookedSpacingReason(spaced.ruledOut, spaced.blocks, 7, names)).toBe(
    'Each of its 2 usable starts falls within 7 days of "Duct repair in the shared trench", which also takes out "Harbour CCTV"; '
    + 'a slice may be touched at most once in 7 days.');
});

test('several windows: each named with its shared slices; only the starts they rule out are counted', () => {
  const duct = window('Duct repair', '2030-03-10', ['s1']);
  const mast = window('Mast repaint', '2030-03-20', ['s1', 's2']);
  const spaced = keepSpacedFromBooked(nights('2030-03-11', '2030-03-19', '2030-03-30'), ['s1', 's2'], [mast, duct], 3);
  expect(spaced.kept).toEqual(nights('2030-03-30'));
  expect(bookedSpacingNote(spaced.ruledOut, spaced.blocks, 3, names)).toBe(
    'Another 2 starts fall within 3 days of a booked window that also takes out one of its slices: '
    + '"Duct repair" ("Harbour CCTV") and "Mast repaint" ("Harbour CCTV" and "Port telemetry").');
});

test('a long window counts from its nearest night; D = 0 keeps every start', () => {
  const long = { title: 'Cable lay', firstDay: dayNumber('2030-03-10'), lastDay: dayNumber('2030-03-14'), slices: new Set(['s1']) };
  expect(keepSpacedFromBooked(nights('2030-03-05', '2030-03-06', '2030-03-18', '2030-03-19'), ['s1'], [long], 5).kept)
    .toEqual(nights('2030-03-05', '2030-03-19'));
  expect(keepSpacedFromBooked(nights('2030-03-12'), ['s1'], [long], 0).kept).toEqual(nights('2030-03-12'));
});
