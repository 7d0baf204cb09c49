// Naming a zone once per screen, and reading dates and times the way people type them.
import { describeZone, timesInLabel } from '@/components/time';
import { parseLooseDate, parseLooseTime, splitLooseDateTime } from '@/components/windows/zoned-time';
import { isValidTimeZone, NETWORK_TIME_ZONE } from '@/shared/time-zone';

const WINTER = new Date('2027-01-08T12:00:00Z');

test('a zone is named with its abbreviation, never the same word twice', () => {
  expect(describeZone('UTC', WINTER)).toBe('UTC');
  expect(describeZone('Europe/Oslo', WINTER)).toBe('Europe/Oslo (CET)');
  expect(describeZone(NETWORK_TIME_ZONE, WINTER)).toBe("GMT-1, the network's zone");
  expect(timesInLabel('America/New_York', WINTER)).toBe('Times in America/New_York (EST)');
});

test('IANA names are accepted, offsets and made-up names are not', () => {
  expect(isValidTimeZone('Europe/Oslo')).toBe(true);
  expect(isValidTimeZone('UTC')).toBe(true);
  expect(isValidTimeZone('+01:00')).toBe(false);
  expect(isValidTimeZone('Europe/Atlantis')).toBe(false);
});

test.each([
  ['2027-01-08', '2027-01-08'], ['20270108', '2027-01-08'], ['2027/1/8', '2027-01-08'], ['8 Jan 2027', '2027-01-08'],
  ['8 January 2027', '2027-01-08'], ['Jan 8, 2027', '2027-01-08'], ['2027-02-30', null], ['8 Foo 2027', null], ['', null],
])('the date "%s" reads as %s', (typed, expected) => {
  expect(parseLooseDate(typed)).toBe(expected);
});

test.each([
  ['01:00', '01:00'], ['1:00', '01:00'], ['0100', '01:00'], ['1.00', '01:00'], ['1', '01:00'], ['930', '09:30'],
  ['13h30', '13:30'], ['24:00', null], ['12:60', null], ['noon', null],
])('the time "%s" reads as %s', (typed, expected) => {
  expect(parseLooseTime(typed)).toBe(expected);
});

test('a date and a time typed in one field are split, in every form the brief names', () => {
  for (const typed of ['20270108 0100', '2027-01-08 01:00', '8 Jan 2027 1:00', '2027-01-08T01:00']) {
    expect(splitLooseDateTime(typed)).toEqual({ date: '2027-01-08', time: '01:00' });
  }
  expect(splitLooseDateTime('2027-01-08')).toBeNull();
});
