// Builds the target state: the current data with the file laid over it, per import kind.
import type { ImportDefaults, ImportIssue } from '../../shared/imports';
import type { Scenario, ScenarioSlice } from '../../shared/scenario';
import { mergeGraphml, type GraphmlMerge } from './merge-graphml';
import type { CsvSlice, ParsedContent } from './types';

type Merge = { target: Scenario | null; errors: ImportIssue[]; graphml?: GraphmlMerge };

/** Replaces items with the same id and appends new ones, keeping the current order. */
function upsertById<T extends { id: string }>(current: T[], incoming: T[]): T[] {
  const byId = new Map(incoming.map((x) => [x.id, x]));
  const kept = current.map((x) => byId.get(x.id) ?? x);
  const known = new Set(current.map((x) => x.id));
  return [...kept, ...incoming.filter((x) => !known.has(x.id))];
}

function mergeCsvSlices(before: Scenario, incoming: CsvSlice[], fileName: string): Merge {
  const errors: ImportIssue[] = [];
  const current = new Map(before.slices.map((s) => [s.id, s]));
  const slices: ScenarioSlice[] = [];
  let placements = before.placements;
  for (const cs of incoming) {
    const existing = current.get(cs.sliceId);
    const say = (message: string) => errors.push({ file: fileName, row: cs.row, message: `slice "${cs.sliceId}": ${message}` });
    if (!existing && !cs.attrs) { say('a new slice needs a slice row'); continue; }
    if (!existing && !cs.body) { say('a new slice needs its function rows (with the site each is placed on)'); continue; }
    const attrs = cs.attrs ?? existing!;
    const body = cs.body ?? { functions: existing!.functions, ties: existing!.ties };
    const { functions: _f, ties: _t, ...plain } = attrs as ScenarioSlice;
    slices.push({ ...plain, functions: body.functions, ties: body.ties });
    if (cs.body) placements = upsertById(placements.map((p) => ({ ...p, id: p.slice })), [{ ...cs.body.placement, id: cs.sliceId }]).map(({ id: _id, ...p }) => p);
  }
  return { target: { ...before, slices: upsertById(before.slices, slices), placements }, errors };
}

/** `defaults` fill what a GraphML file lacks (other kinds ignore them). */
export function mergeImport(before: Scenario, content: ParsedContent, fileName: string, defaults?: ImportDefaults): Merge {
  switch (content.kind) {
    case 'scenario':
      return { target: content.scenario, errors: [] };
    case 'graphml': {
      const graphml = mergeGraphml(before, content, fileName, defaults);
      return { target: graphml.target, errors: graphml.errors, graphml };
    }
    case 'csv-sites':
      return { target: { ...before, sites: upsertById(before.sites, content.sites) }, errors: [] };
    case 'csv-spans':
      return { target: { ...before, spans: upsertById(before.spans, content.spans) }, errors: [] };
    case 'csv-slices':
      return mergeCsvSlices(before, content.slices, fileName);
  }
}
