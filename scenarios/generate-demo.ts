// Generates scenarios/demo.json: the invented Tidemark Networks on the Ambry Coast (DESIGN §6).
// Run: npx tsx scenarios/generate-demo.ts  — deterministic: the same seed always writes the same file.
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import type { Scenario, ScenarioPlacement, ScenarioSlice } from '../shared/scenario';
import { SCENARIO_FORMAT } from '../shared/scenario';
import { formatIssue, validateScenario } from '../shared/scenario-validate';
import { makeCoast, makeSites, outlinePolygon } from './generate/geography';
import { DemoNetwork } from './generate/network';
import { createRng } from '../planner/random/rng';
import { makeSlice } from './generate/slices';
import { PROFILES } from './generate/tenants';
import { makeSpans, tagSharedDucts } from './generate/topology';
import { makeWindows } from './generate/windows';

const SEED = 20261203;

export function generateDemo(seed = SEED): Scenario {
  const rng = createRng(seed);
  const coast = makeCoast(rng);
  const sites = makeSites(coast, rng);
  const spans = makeSpans(sites, rng);
  tagSharedDucts(spans, sites, ['core-vellaport', 'core-castrenholm', 'agg-drennock', 'agg-quellhaven']);
  const net = new DemoNetwork(sites, spans);
  const placed: { slice: ScenarioSlice; placement: ScenarioPlacement; order: number }[] = [];
  // Round-robin over tenants so no tenant is left with only the scraps of capacity.
  const longest = Math.max(...PROFILES.map((p) => p.count));
  for (let n = 1; n <= longest; n++) {
    PROFILES.forEach((profile, t) => {
      if (n <= profile.count) placed.push({ ...makeSlice(rng, profile, n, t, net), order: t * 1000 + n });
    });
  }
  placed.sort((a, b) => a.order - b.order);
  return {
    format: SCENARIO_FORMAT,
    name: 'Tidemark Networks — Ambry Coast (invented demo)',
    outline: outlinePolygon(coast),
    sites,
    spans,
    tenants: PROFILES.map((p) => p.tenant),
    slices: placed.map((p) => p.slice),
    placements: placed.map((p) => p.placement),
    windows: makeWindows(sites, spans),
  };
}

/** Pretty-printed, but arrays of plain values (coordinates, paths) stay on one line so the file reads well. */
export function toDemoJson(scenario: Scenario): string {
  const pretty = JSON.stringify(scenario, null, 2);
  return `${pretty.replace(/\[([^[\]{}]*)\]/g, (_m, inner: string) => `[${inner.split(',').map((s) => s.trim()).join(', ')}]`)}\n`;
}

function main(): void {
  const scenario = generateDemo();
  const result = validateScenario(scenario);
  const issues = result.ok ? result.warnings : [...result.errors, ...result.warnings];
  issues.forEach((i) => console.error(formatIssue(i)));
  if (!result.ok) process.exit(1);
  const file = join(__dirname, 'demo.json');
  writeFileSync(file, toDemoJson(scenario));
  console.log(`wrote ${file}: ${scenario.sites.length} sites, ${scenario.spans.length} spans, ${scenario.slices.length} slices`);
}

if (require.main === module) main();
