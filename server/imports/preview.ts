// The preview of an upload: read the file (in a check thread), lay it over the current data, validate the result, list what changes.
import type { ImportDefaults, ImportIssue, ImportKind, ImportMapping, ImportPreview, ImportSources } from '../../shared/imports';
import type { Scenario } from '../../shared/scenario';
import { validateScenario } from '../../shared/scenario-validate';
import type { Queryable } from '../../db/client';
import { currentInventory } from '../services/inventory/inventory-cache';
import { scenarioChecksum } from './canonical';
import { uploadChecks } from './check-thread';
import { diffScenarios, emptyDiff, type ScenarioDiff } from './diff';
import { importSources } from './import-sources';
import { mergeImport } from './merge';
import { removalErrors } from './removal-checks';

/** What apply needs: the state the preview was computed against (as a checksum) and the target to write. */
export type ImportPayload = { beforeChecksum: string; target: Scenario };
export type PreviewResult = { kind: ImportKind; preview: ImportPreview; payload: ImportPayload | null };

/** Whole-state kinds remove what the file lacks, so a partly read file must not be merged at all. */
const WHOLE_STATE: ReadonlySet<ImportKind> = new Set(['scenario', 'graphml']);

export function toPreview(diff: ScenarioDiff, errors: ImportIssue[], warnings: ImportIssue[]): ImportPreview {
  const lists = Object.values(diff);
  const sum = (f: (d: (typeof lists)[number]) => number) => lists.reduce((n, d) => n + f(d), 0);
  const pick = <K extends 'adds' | 'changes' | 'removes'>(k: K) =>
    Object.fromEntries(Object.entries(diff).map(([entity, d]) => [entity, d[k]])) as { [E in keyof ScenarioDiff]: ScenarioDiff[E][K] };
  return {
    adds: pick('adds'), changes: pick('changes'), removes: pick('removes'), errors, warnings,
    counts: {
      adds: sum((d) => d.adds.length), changes: sum((d) => d.changes.length), removes: sum((d) => d.removes.length),
      errors: errors.length, warnings: warnings.length,
    },
  };
}

/** Defaults and a mapping are for GraphML files; for other kinds they are said to be ignored. */
function ignoredOptions(kind: ImportKind, input: { fileName: string; defaults?: ImportDefaults; mapping?: ImportMapping }): ImportIssue[] {
  if (kind === 'graphml') return [];
  const file = input.fileName;
  return [
    ...(input.defaults ? [{ file, message: 'defaults fill values of GraphML files only; they were ignored for this file' }] : []),
    ...(input.mapping ? [{ file, message: 'the attribute mapping applies to GraphML files only; it was ignored for this file' }] : []),
  ];
}

export async function buildPreview(
  db: Queryable,
  input: { fileName: string; bytes: Buffer; requestedKind?: string; defaults?: ImportDefaults; mapping?: ImportMapping },
): Promise<PreviewResult> {
  const { fileName, defaults } = input;
  // The file alone decides what reading it costs: that happens in a check thread with a time and memory budget.
  const { kind, parsed } = await uploadChecks.read({ fileName, bytes: input.bytes, requestedKind: input.requestedKind, mapping: input.mapping });
  const errors = [...parsed.errors];
  const warnings = [...parsed.warnings, ...ignoredOptions(kind, input)];
  const { scenario: before } = await currentInventory(db);
  const merged: ReturnType<typeof mergeImport> = WHOLE_STATE.has(kind) && errors.length > 0 ? { target: null, errors: [] } : mergeImport(before, parsed.content, fileName, defaults);
  errors.push(...merged.errors);
  warnings.push(...(merged.graphml?.warnings ?? []));
  const sources = (diff: ScenarioDiff | null): { sources?: ImportSources } => (parsed.content.kind === 'graphml'
    ? { sources: importSources({ names: parsed.content.names, merged: merged.graphml ?? null, diff, defaults, before }) }
    : {});
  if (!merged.target) return { kind, preview: { ...toPreview(emptyDiff(), errors, warnings), ...sources(null) }, payload: null };
  const diff = diffScenarios(before, merged.target);
  // Paths of a scenario file point into the file itself; for the other kinds they point into the merged result.
  const resultFile = kind === 'scenario' ? fileName : `${fileName} (merged with the current data)`;
  const validation = validateScenario(merged.target);
  if (!validation.ok) errors.push(...validation.errors.map((i) => ({ file: resultFile, path: i.path, message: i.message })));
  warnings.push(...validation.warnings.map((i) => ({ file: resultFile, path: i.path, message: i.message })));
  errors.push(...await removalErrors(db, merged.target, diff, fileName));
  const payload = errors.length === 0 ? { beforeChecksum: scenarioChecksum(before), target: merged.target } : null;
  return { kind, preview: { ...toPreview(diff, errors, warnings), ...sources(diff) }, payload };
}
