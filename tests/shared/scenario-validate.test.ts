// Scenario validation: schema issues and every semantic error kind, each at its exact JSON path.
import fc from 'fast-check';
import { formatIssue, validateScenario } from '../../shared/scenario-validate';
import type { ScenarioIssue } from '../../shared/scenario-validate';
import { smallScenario } from './scenario-fixture';

/* eslint-disable @typescript-eslint/no-explicit-any -- tests break the typed fixture on purpose */
type Mutable = any;

function errorsOf(mutate: (s: Mutable) => void): ScenarioIssue[] {
  const s: Mutable = smallScenario();
  mutate(s);
  const result = validateScenario(s);
  if (result.ok) throw new Error('expected the scenario to be rejected');
  return result.errors;
}

function expectError(mutate: (s: Mutable) => void, path: string, fragment: string): void {
  const errors = errorsOf(mutate);
  expect(errors).toContainEqual({ path, message: expect.stringContaining(fragment) });
}

describe('validateScenario', () => {
  it('accepts the small valid file with no errors or warnings', () => {
    const result = validateScenario(smallScenario());
    expect(result).toEqual({ ok: true, scenario: smallScenario(), warnings: [] });
  });

  it('accepts extra fields and drops them', () => {
    const s: Mutable = { ...smallScenario(), comment: 'hello' };
    const result = validateScenario(s);
    expect(result.ok && 'comment' in result.scenario).toBe(false);
    expect(result.ok).toBe(true);
  });

  describe('schema errors carry JSON paths and plain messages', () => {
    it('missing field', () => expectError((s) => delete s.sites[0].name, '$.sites[0].name', 'is required'));
    it('wrong format', () => expectError((s) => (s.format = 'other/1'), '$.format', ''));
    it('window time without offset', () =>
      expectError((s) => (s.windows[0].start = '2026-12-03T22:00:00'), '$.windows[0].start', 'time-zone offset'));
    it('anchor union reports the closest branch', () =>
      expectError((s) => (s.slices[0].functions[0].anchor = { site: 5 }), '$.slices[0].functions[0].anchor.site', 'expected string'));
    it('reduced fraction out of range', () =>
      expectError((s) => (s.windows[0].reduced[0].fraction = 1), '$.windows[0].reduced[0].fraction', '(0, 1)'));
    it('sd must be 6 hex digits', () => expectError((s) => (s.slices[0].sd = 'XYZ123'), '$.slices[0].sd', 'hex'));
  });

  describe('duplicate ids within their kind', () => {
    it('site', () => expectError((s) => s.sites.push({ ...s.sites[0] }), '$.sites[3].id', 'duplicate site id "A"'));
    it('span', () => expectError((s) => s.spans.push({ ...s.spans[0] }), '$.spans[2].id', 'duplicate span id "AB"'));
    it('tenant', () => expectError((s) => s.tenants.push({ ...s.tenants[0] }), '$.tenants[1].id', 'duplicate tenant'));
    it('window', () => expectError((s) => s.windows.push({ ...s.windows[0] }), '$.windows[1].id', 'duplicate window'));
    it('slice', () =>
      expectError((s) => s.slices.push({ ...s.slices[1], functions: [{ id: 'h1', cpu: 1 }], ties: [] }), '$.slices[2].id', 'duplicate slice id "S2"'));
    it('function ids are unique across slices', () =>
      expectError((s) => (s.slices[1].functions[1].id = 'f1'), '$.slices[1].functions[1].id', 'duplicate function id "f1"'));
    it('tie ids are unique across slices', () =>
      expectError((s) => (s.slices[1].ties[0].id = 't1'), '$.slices[1].ties[0].id', 'duplicate tie id "t1"'));
  });

  describe('unknown references', () => {
    it('span end', () => expectError((s) => (s.spans[1].a = 'Z'), '$.spans[1].a', 'unknown site "Z"'));
    it('span joining a site to itself', () => expectError((s) => (s.spans[1].a = 'B'), '$.spans[1].b', 'to itself'));
    it('slice tenant', () => expectError((s) => (s.slices[0].tenant = 'nobody'), '$.slices[0].tenant', 'unknown tenant'));
    it('tie end in another slice', () =>
      expectError((s) => (s.slices[0].ties[0].to = 'g2'), '$.slices[0].ties[0].to', 'belongs to slice "S2"'));
    it('tie end unknown', () => expectError((s) => (s.slices[0].ties[0].from = 'zz'), '$.slices[0].ties[0].from', 'unknown function'));
    it('anchor site', () =>
      expectError((s) => (s.slices[0].functions[0].anchor = { site: 'Z' }), '$.slices[0].functions[0].anchor.site', 'unknown site'));
    it('placement slice', () =>
      expectError((s) => s.placements.push({ slice: 'S9', sites: {}, paths: {} }), '$.placements[2].slice', 'unknown slice "S9"'));
    it('placement site', () => expectError((s) => (s.placements[0].sites.f2 = 'Z'), '$.placements[0].sites.f2', 'unknown site "Z"'));
    it('path span', () => expectError((s) => (s.placements[0].paths.t1[1] = 'ZZ'), '$.placements[0].paths.t1[1]', 'unknown span'));
    it('window down site and span', () => {
      const errors = errorsOf((s) => (s.windows[0].down = { sites: ['Z'], spans: ['AB', 'ZZ'] }));
      expect(errors.map((e) => e.path)).toEqual(['$.windows[0].down.sites[0]', '$.windows[0].down.spans[1]']);
    });
    it('window reduced element', () =>
      expectError((s) => (s.windows[0].reduced = [{ span: 'ZZ', fraction: 0.5 }]), '$.windows[0].reduced[0].span', 'unknown span'));
  });

  describe('placements', () => {
    it('missing function', () => expectError((s) => delete s.placements[0].sites.f2, '$.placements[0].sites', 'missing function "f2"'));
    it('extra function', () => expectError((s) => (s.placements[0].sites.zz = 'A'), '$.placements[0].sites.zz', 'not a function'));
    it('missing tie', () => expectError((s) => delete s.placements[1].paths.u1, '$.placements[1].paths', 'missing tie "u1"'));
    it('extra tie', () => expectError((s) => (s.placements[1].paths.t1 = []), '$.placements[1].paths.t1', 'not a tie'));
    it('slice without placement', () => expectError((s) => s.placements.pop(), '$.slices[1]', 'no placement'));
    it('slice with two placements', () =>
      expectError((s) => s.placements.push({ ...s.placements[1] }), '$.placements[2].slice', 'more than one placement'));
    it('keys that are not identifiers are quoted in the path', () =>
      expectError((s) => (s.placements[0].sites['f-9'] = 'A'), "$.placements[0].sites['f-9']", 'not a function'));
  });

  describe('paths', () => {
    it('non-contiguous span', () =>
      expectError((s) => (s.placements[0].paths.t1 = ['CB', 'AB']), '$.placements[0].paths.t1[0]', 'does not continue the path from site "A"'));
    it('path that stops short', () =>
      expectError((s) => (s.placements[0].paths.t1 = ['AB']), '$.placements[0].paths.t1', 'ends at site "B"'));
    it('empty path between different sites', () =>
      expectError((s) => (s.placements[0].paths.t1 = []), '$.placements[0].paths.t1', 'empty path'));
    it('spans are undirected: a path may walk a span from b to a', () => {
      const s: Mutable = smallScenario();
      s.spans[0] = { ...s.spans[0], a: 'B', b: 'A' };
      expect(validateScenario(s).ok).toBe(true);
    });
  });

  it('window end must be after start', () =>
    expectError((s) => (s.windows[0].end = '2026-12-03T23:00:00+01:00'), '$.windows[0].end', 'must be after start'));

  it('reports every problem, not just the first', () => {
    const errors = errorsOf((s) => {
      s.spans[0].b = 'Z';
      s.slices[1].tenant = 'nobody';
      s.windows[0].down.spans = ['nope'];
      s.placements[0].paths.t1 = ['CB', 'AB'];
    });
    expect(errors.map((e) => e.path).sort()).toEqual(
      ['$.placements[0].paths.t1[0]', '$.slices[1].tenant', '$.spans[0].b', '$.windows[0].down.spans[0]'].sort(),
    );
  });

  it('formatIssue joins path and message', () => {
    expect(formatIssue({ path: '$.sites[0].id', message: 'duplicate' })).toBe('$.sites[0].id: duplicate');
  });

  it('never throws, and every issue path starts at $ (property: any JSON value gets an answer)', () => {
    fc.assert(
      fc.property(fc.oneof(fc.jsonValue(), fc.constant(smallScenario() as unknown)), (value) => {
        const result = validateScenario(value);
        const issues = result.ok ? result.warnings : result.errors;
        return issues.every((i) => i.path.startsWith('$'));
      }),
    );
  });
});
