// Pure pieces behind the window screens: local wall time ↔ instant across DST, percent parsing, what an edit
// sends, which actions a role gets in which state, and the MOP file checks.
import fc from 'fast-check';
import { instantToWallFields, toIsoWithOffset, zonedWallToInstant } from '@/components/windows/zoned-time';
import { parsePercent } from '@/components/windows/window-form-state';
import { patchTouchesImpact, windowPatchFor } from '@/components/windows/window-changes';
import { windowActions } from '@/components/windows/lifecycle';
import { MOP_MAX_BYTES, mopMime, mopProblem } from '@/components/windows/mop-file';
import { windowFixture } from './window-test-kit';

const BERLIN = 'Europe/Berlin';

test('wall time in a zone becomes the right instant, on both sides of the EU daylight-saving changes', () => {
  // EU summer time: last Sunday of March 01:00 UTC to last Sunday of October 01:00 UTC (Directive 2000/84/EC; memory).
  const winter = zonedWallToInstant('2030-01-10', '22:00', BERLIN);
  expect(winter.ok && new Date(winter.instantMs).toISOString()).toBe('2030-01-10T21:00:00.000Z');
  const summer = zonedWallToInstant('2030-07-01', '22:00', BERLIN);
  expect(summer.ok && new Date(summer.instantMs).toISOString()).toBe('2030-07-01T20:00:00.000Z');
  // 31 March 2030: clocks go from 02:00 to 03:00, so 02:30 does not exist.
  expect(zonedWallToInstant('2030-03-31', '02:30', BERLIN)).toEqual({ ok: false, reason: 'skipped' });
  // 27 October 2030: 02:30 happens twice; the earlier (summer time) reading is taken.
  const repeated = zonedWallToInstant('2030-10-27', '02:30', BERLIN);
  expect(repeated.ok && toIsoWithOffset(repeated.instantMs, BERLIN)).toBe('2030-10-27T02:30:00+02:00');
  expect(zonedWallToInstant('2030-02-30', '10:00', BERLIN)).toEqual({ ok: false, reason: 'format' });
  expect(zonedWallToInstant('2030-02-10', '24:10', BERLIN)).toEqual({ ok: false, reason: 'format' });
});

test('property: a form time survives the round trip instant → fields → instant in several zones', () => {
  const zones = ['Europe/Berlin', 'America/New_York', 'Asia/Kolkata', 'Atlantic/Azores', 'UTC'];
  fc.assert(
    fc.property(fc.integer({ min: Date.UTC(2026, 0, 1) / 60_000, max: Date.UTC(2032, 0, 1) / 60_000 }), fc.constantFrom(...zones), (minute, zone) => {
      const instantMs = minute * 60_000;
      const { date, time } = instantToWallFields(new Date(instantMs).toISOString(), zone);
      const back = zonedWallToInstant(date, time, zone);
      // In a repeated hour the earlier instant is chosen; it shows the same wall time, at most an hour before.
      return back.ok && instantMs - back.instantMs >= 0 && instantMs - back.instantMs <= 3_600_000
        && Date.parse(toIsoWithOffset(back.instantMs, zone)) === back.instantMs;
    }),
  );
});

test('capacity left is read as a percentage strictly between 0 and 100', () => {
  expect(parsePercent('40')).toBe(0.4);
  expect(parsePercent(' 12,5 % ')).toBe(0.125);
  expect([parsePercent('0'), parsePercent('100'), parsePercent('abc'), parsePercent('')]).toEqual([null, null, null, null]);
});

test('an edit sends the version and only what changed; times and equipment count as impact changes', () => {
  const w = windowFixture();
  const same = { title: w.title, startsAt: '2030-01-10T22:00:00+01:00', endsAt: w.endsAt, workType: w.workType, notes: null, elements: [{ kind: 'site' as const, id: 'cell-pellow-sands', effect: 'down' as const }] };
  expect(windowPatchFor(w, same, null)).toEqual({ version: 3 });
  const moved = windowPatchFor(w, { ...same, endsAt: '2030-01-11T03:00:00+01:00', notes: 'Bring a torch.' }, null);
  expect(moved).toEqual({ version: 3, endsAt: '2030-01-11T03:00:00+01:00', notes: 'Bring a torch.' });
  expect(patchTouchesImpact(moved)).toBe(true);
  expect(patchTouchesImpact(windowPatchFor(w, { ...same, title: 'New title' }, null))).toBe(false);
  const reduced = windowPatchFor(w, { ...same, elements: [{ kind: 'site', id: 'cell-pellow-sands', effect: 'reduced', fraction: 0.5 }] }, null);
  expect(reduced.elements).toHaveLength(1);
});

test('actions follow role and state', () => {
  expect(windowActions(['engineer'], 'draft')).toEqual({ edit: true, assess: true, withdraw: true, rollBack: false, viewImpact: true });
  expect(windowActions(['engineer'], 'underway')).toMatchObject({ withdraw: false, rollBack: true });
  expect(windowActions(['planner'], 'done')).toMatchObject({ rollBack: false });
  expect(windowActions(['approver'], 'underway')).toMatchObject({ rollBack: false });
  expect(windowActions(['planner'], 'planned')).toMatchObject({ edit: true, assess: false, withdraw: true });
  expect(windowActions(['approver'], 'draft')).toMatchObject({ edit: false, assess: false, withdraw: false });
  expect(windowActions(['tenant'], 'assessed')).toMatchObject({ edit: false, assess: false, viewImpact: true });
  expect(windowActions(['admin'], 'underway')).toMatchObject({ edit: false, withdraw: false });
  expect(windowActions(['admin'], 'withdrawn')).toMatchObject({ edit: false, viewImpact: false });
});

test('the MOP must be PDF or text and within the size cap', () => {
  expect(mopMime('mop.pdf', 'application/octet-stream')).toBe('application/pdf');
  expect(mopMime('steps.txt', '')).toBe('text/plain');
  expect(mopMime('photo.jpg', 'image/jpeg')).toBeNull();
  expect(mopProblem({ name: 'photo.jpg', sizeBytes: 100, mime: null })).toMatch(/not a PDF or text/);
  expect(mopProblem({ name: 'big.pdf', sizeBytes: MOP_MAX_BYTES + 1, mime: 'application/pdf' })).toMatch(/the limit is 10\.0 MB/);
  expect(mopProblem({ name: 'ok.pdf', sizeBytes: MOP_MAX_BYTES, mime: 'application/pdf' })).toBeNull();
});
