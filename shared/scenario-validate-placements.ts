// Semantic checks of placements: one per slice, every function and tie covered, paths made of known, contiguous spans.
import type { Scenario, ScenarioPlacement, ScenarioSlice } from './scenario';
import type { IssueCollector, PathSegment, ScenarioIndex } from './scenario-validate-context';
import { jsonPath } from './scenario-validate-context';

export interface PlacedSlice {
  placement: ScenarioPlacement;
  slice: ScenarioSlice;
  /** Index of the placement in `$.placements`. */
  index: number;
}

/** The first placement of each known slice: the one later checks read (extra placements are errors). */
export function placedSlices(s: Scenario, ix: ScenarioIndex): PlacedSlice[] {
  const seen = new Set<string>();
  const placed: PlacedSlice[] = [];
  s.placements.forEach((placement, index) => {
    const slice = ix.slices.get(placement.slice)?.value;
    if (!slice || seen.has(slice.id)) return;
    seen.add(slice.id);
    placed.push({ placement, slice, index });
  });
  return placed;
}

export function checkPlacementCoverage(s: Scenario, ix: ScenarioIndex, out: IssueCollector): void {
  const first = new Map<string, number>();
  s.placements.forEach((p, i) => {
    if (!ix.slices.has(p.slice)) out.error(['placements', i, 'slice'], `unknown slice "${p.slice}"`);
    const earlier = first.get(p.slice);
    if (earlier === undefined) first.set(p.slice, i);
    else out.error(['placements', i, 'slice'], `slice "${p.slice}" has more than one placement (first at ${jsonPath(['placements', earlier])})`);
  });
  s.slices.forEach((slice, i) => {
    if (ix.slices.get(slice.id)?.path[1] === i && !first.has(slice.id)) {
      out.error(['slices', i], `slice "${slice.id}" has no placement`);
    }
  });
}

function checkKeys(kind: 'function' | 'tie', wanted: string[], given: string[], at: PathSegment[], sliceId: string, out: IssueCollector): void {
  const givenSet = new Set(given);
  const wantedSet = new Set(wanted);
  for (const id of wanted) if (!givenSet.has(id)) out.error(at, `missing ${kind} "${id}" of slice "${sliceId}"`);
  for (const id of given) if (!wantedSet.has(id)) out.error([...at, id], `"${id}" is not a ${kind} of slice "${sliceId}"`);
}

/** Walks the path from the `from` function's site; spans are undirected. */
function checkPath(ps: PlacedSlice, tieId: string, ix: ScenarioIndex, out: IssueCollector): void {
  const { placement, index } = ps;
  const at: PathSegment[] = ['placements', index, 'paths', tieId];
  const spanIds = placement.paths[tieId];
  const unknown = spanIds.map((id, k) => ({ id, k })).filter(({ id }) => !ix.spans.has(id));
  unknown.forEach(({ id, k }) => out.error([...at, k], `unknown span "${id}"`));
  const tie = ix.ties.get(tieId)?.value;
  if (!tie || unknown.length > 0) return;
  const start = placement.sites[tie.from];
  const end = placement.sites[tie.to];
  if (!ix.sites.has(start) || !ix.sites.has(end)) return; // reported as missing or unknown sites
  let here = start;
  for (let k = 0; k < spanIds.length; k++) {
    const span = ix.spans.get(spanIds[k])!.value;
    if (span.a !== here && span.b !== here) {
      out.error([...at, k], `span "${span.id}" (${span.a}–${span.b}) does not continue the path from site "${here}"`);
      return;
    }
    here = span.a === here ? span.b : span.a;
  }
  if (here !== end) {
    const message = spanIds.length === 0
      ? `empty path, but "${tie.from}" is on site "${start}" and "${tie.to}" on site "${end}"`
      : `path ends at site "${here}", but "${tie.to}" is on site "${end}"`;
    out.error(at, message);
  }
}

export function checkPlacementContents(s: Scenario, ix: ScenarioIndex, out: IssueCollector): void {
  const placed = placedSlices(s, ix);
  for (const ps of placed) {
    const { placement, slice, index } = ps;
    const at: PathSegment[] = ['placements', index];
    checkKeys('function', slice.functions.map((f) => f.id), Object.keys(placement.sites), [...at, 'sites'], slice.id, out);
    checkKeys('tie', slice.ties.map((t) => t.id), Object.keys(placement.paths), [...at, 'paths'], slice.id, out);
    for (const [fnId, siteId] of Object.entries(placement.sites)) {
      if (!ix.sites.has(siteId)) out.error([...at, 'sites', fnId], `unknown site "${siteId}"`);
    }
    const tieIds = new Set(slice.ties.map((t) => t.id));
    for (const tieId of Object.keys(placement.paths)) if (tieIds.has(tieId)) checkPath(ps, tieId, ix, out);
  }
  // Placements of unknown slices and extra placements still name sites and spans: check those references too.
  const checked = new Set(placed.map((ps) => ps.index));
  s.placements.forEach((p, i) => {
    if (checked.has(i)) return;
    for (const [fnId, siteId] of Object.entries(p.sites)) {
      if (!ix.sites.has(siteId)) out.error(['placements', i, 'sites', fnId], `unknown site "${siteId}"`);
    }
    for (const [tieId, spans] of Object.entries(p.paths)) {
      spans.forEach((id, k) => {
        if (!ix.spans.has(id)) out.error(['placements', i, 'paths', tieId, k], `unknown span "${id}"`);
      });
    }
  });
}
