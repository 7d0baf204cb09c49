// What changed between two placement revisions: functions on another site, ties on another path.
import type { PlacementRevision } from '@/shared/inventory';

export type PlacementMove =
  | { kind: 'function'; id: string; from: string | null; to: string | null }
  | { kind: 'tie'; id: string; from: readonly string[] | null; to: readonly string[] | null };

function samePath(a: readonly string[] | undefined, b: readonly string[] | undefined): boolean {
  if (!a || !b) return a === b;
  return a.length === b.length && a.every((span, i) => span === b[i]);
}

/** Moves from `before` to `after`; with no `before` (the first revision) nothing counts as moved. */
export function placementMoves(before: PlacementRevision | undefined, after: PlacementRevision): PlacementMove[] {
  if (!before) return [];
  const moves: PlacementMove[] = [];
  const functionIds = new Set([...Object.keys(before.sites), ...Object.keys(after.sites)]);
  for (const id of [...functionIds].sort()) {
    if (before.sites[id] !== after.sites[id]) moves.push({ kind: 'function', id, from: before.sites[id] ?? null, to: after.sites[id] ?? null });
  }
  const tieIds = new Set([...Object.keys(before.paths), ...Object.keys(after.paths)]);
  for (const id of [...tieIds].sort()) {
    if (!samePath(before.paths[id], after.paths[id])) moves.push({ kind: 'tie', id, from: before.paths[id] ?? null, to: after.paths[id] ?? null });
  }
  return moves;
}

/** Sites and spans a placement uses, for highlighting it on the map. */
export function placementElements(sites: Record<string, string>, paths: Record<string, readonly string[]>) {
  return {
    sites: [...new Set(Object.values(sites))],
    spans: [...new Set(Object.values(paths).flat())],
  };
}
