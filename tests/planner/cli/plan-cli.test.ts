// The `npm run plan` command line, spawned as the automated checks call it: JSON contract, table, exit codes.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { buildScenario } from '../../../scenarios/generate/scenario-builder';
import { buildInventory, compileWindow } from '../../../planner/model/build-inventory';
import type { SlicePlan } from '../../../planner/model/types';
import { main } from '../../../planner/cli/run-plan';
import { verifyPlan } from '../../../planner/verify/verify-plan';
import type { Scenario } from '../../../shared/scenario';

jest.setTimeout(120_000);

const root = join(__dirname, '../../..');
const dir = mkdtempSync(join(tmpdir(), 'slackwater-cli-'));
const scenario: Scenario = buildScenario({ sites: 10, slices: 20, seed: 5, windows: 2 });
scenario.windows!.push({ id: 'quiet', title: 'Touches nothing', start: '2030-04-01T22:00:00+01:00', end: '2030-04-02T02:00:00+01:00', down: { sites: [], spans: [] } });
const file = join(dir, 'scenario.json');
writeFileSync(file, JSON.stringify(scenario));
const tiny = join(dir, 'tiny.json');
writeFileSync(tiny, JSON.stringify(buildScenario({ sites: 6, slices: 6, seed: 2, windows: 1 })));

type Run = { code: number | null; stdout: string; stderr: string };

/** As the checks call it: a real process through npm. Slow (seconds), so used sparingly. */
function spawnPlan(args: string[]): Run {
  const r = spawnSync('npm', ['run', '--silent', 'plan', '--', ...args], { cwd: root, encoding: 'utf8' });
  return { code: r.status, stdout: r.stdout, stderr: r.stderr };
}

/** The same code in-process, with the output streams captured. */
async function plan(args: string[]): Promise<Run> {
  let stdout = '';
  let stderr = '';
  const code = await main(args, { out: (t) => (stdout += t), err: (t) => (stderr += t) });
  return { code, stdout, stderr };
}

interface Doc {
  window: string; mode: string; seed: number; elapsedMs: number; affected: string[];
  slices: SlicePlan[]; knockOn: string[]; objective: { unresolved: number; moved: number; rerouted: number; moveCost: number };
}

function expectBadInput(r: Run, mentions: string | RegExp): void {
  expect(r.code).toBe(2);
  expect(r.stdout).toBe('');
  const lines = r.stderr.trimEnd().split('\n');
  expect(lines).toHaveLength(1);
  expect(lines[0]).toMatch(mentions);
}

describe('plan command line', () => {
  it('prints the JSON contract through npm run, and the plan verifies', () => {
    const r = spawnPlan([file, '--window', 'window-1', '--mode', 'serial', '--seed', '7', '--json']);
    expect(r.stderr).toBe('');
    expect(r.code).toBe(0);
    const doc = JSON.parse(r.stdout) as Doc;
    expect(doc).toMatchObject({ window: 'window-1', mode: 'serial', seed: 7 });
    expect(doc.elapsedMs).toBeGreaterThanOrEqual(0);
    expect(doc.affected.length).toBeGreaterThan(0);
    // every affected slice has an entry; any other entry is a knock-on move, named as such
    const affected = new Set(doc.affected);
    expect(doc.slices.filter((s) => affected.has(s.slice)).map((s) => s.slice).sort()).toEqual([...doc.affected].sort());
    const knockOn = doc.slices.filter((s) => !affected.has(s.slice));
    expect(doc.knockOn).toEqual(knockOn.map((s) => s.slice));
    for (const s of knockOn) expect(s.madeRoomFor!.every((id) => affected.has(id))).toBe(true);
    for (const k of ['unresolved', 'moved', 'rerouted', 'moveCost'] as const) expect(typeof doc.objective[k]).toBe('number');
    const inv = buildInventory(scenario);
    for (const s of doc.slices.filter((x) => x.outcome !== 'unresolved')) {
      const info = scenario.slices.find((x) => x.id === s.slice)!;
      expect(Object.keys(s.sites).sort()).toEqual(info.functions.map((f) => f.id).sort());
      expect(Object.keys(s.paths).sort()).toEqual(info.ties.map((t) => t.id).sort());
    }
    const window = compileWindow(scenario.windows!.find((w) => w.id === 'window-1')!);
    expect(verifyPlan(inv, window, { affected: doc.affected, slices: doc.slices }).violations).toEqual([]);
  });

  it('gives the same plan for the same seed', async () => {
    const strip = (s: string) => ({ ...JSON.parse(s), elapsedMs: 0 });
    const a = await plan([tiny, '--window', 'window-1', '--seed', '3', '--json']);
    const b = await plan([tiny, '--window=window-1', '--seed=3', '--json']);
    expect(JSON.parse(a.stdout).affected.length).toBeGreaterThan(0);
    expect(a.code).toBe(0);
    expect(strip(b.stdout)).toEqual(strip(a.stdout));
  });

  it('a window touching nothing gives an empty plan', async () => {
    const r = await plan([file, '--window', 'quiet', '--mode', 'greedy', '--json']);
    const doc = JSON.parse(r.stdout) as Doc;
    expect(doc.affected).toEqual([]);
    expect(doc.slices).toEqual([]);
    expect(doc.knockOn).toEqual([]);
  });

  it('runs the threaded, shared-eval and exact modes', async () => {
    for (const mode of ['islands', 'shared-eval', 'exact']) {
      const r = await plan([tiny, '--window', 'window-1', '--mode', mode, '--json']);
      expect(r.stderr).toBe('');
      expect(r.code).toBe(0);
      expect(JSON.parse(r.stdout).mode).toBe(mode);
    }
  });

  it('prints a readable table without --json', async () => {
    const r = await plan([file, '--window', 'window-1', '--mode', 'greedy']);
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/window window-1 · mode greedy/);
    expect(r.stdout).toMatch(/slice\s+outcome/);
    expect(() => JSON.parse(r.stdout)).toThrow();
  });

  it('rejects bad input with exit 2, one line on stderr and nothing on stdout (as a real process)', () => {
    expectBadInput(spawnPlan([join(dir, 'missing.json'), '--window', 'w']), /not found.*missing\.json/);
  });

  it('names each kind of bad input', async () => {
    expectBadInput(await plan([join(dir, 'missing.json'), '--window', 'w']), /not found.*missing\.json/);
    const notJson = join(dir, 'broken.json');
    writeFileSync(notJson, '{ "format": ');
    expectBadInput(await plan([notJson, '--window', 'w']), /not valid JSON/);
    const invalid = join(dir, 'invalid.json');
    writeFileSync(invalid, JSON.stringify({ ...scenario, sites: [{ ...scenario.sites[0], cpu: -1 }, ...scenario.sites.slice(1)] }));
    expectBadInput(await plan([invalid, '--window', 'window-1']), /\$\.sites\[0\]\.cpu/);
    expectBadInput(await plan([file, '--window', 'nope']), /unknown window "nope"/);
    expectBadInput(await plan([file, '--window', 'window-1', '--mode', 'fast']), /unknown mode "fast"/);
    expectBadInput(await plan([file, '--window', 'window-1', '--seed', 'abc']), /seed/);
    expectBadInput(await plan([file]), /missing --window/);
    expectBadInput(await plan([file, '--window', 'window-1', '--colour']), /unknown option "--colour"/);
  });
});
