// Semantic checks that need no placement: duplicate ids and references between sites, spans, tenants, slices and windows.
import type { Scenario } from './scenario';
import type { IssueCollector, PathSegment, ScenarioIndex } from './scenario-validate-context';
import { jsonPath } from './scenario-validate-context';

interface IdEntry {
  id: string;
  path: PathSegment[];
}

/** Every id occurrence, grouped by kind; function and tie ids are collected across all slices. */
function idsByKind(s: Scenario): Record<string, IdEntry[]> {
  const list = (items: readonly { id: string }[], key: string): IdEntry[] =>
    items.map((item, i) => ({ id: item.id, path: [key, i, 'id'] }));
  return {
    site: list(s.sites, 'sites'),
    span: list(s.spans, 'spans'),
    tenant: list(s.tenants, 'tenants'),
    slice: list(s.slices, 'slices'),
    function: s.slices.flatMap((sl, i) => sl.functions.map((f, k) => ({ id: f.id, path: ['slices', i, 'functions', k, 'id'] }))),
    tie: s.slices.flatMap((sl, i) => sl.ties.map((t, k) => ({ id: t.id, path: ['slices', i, 'ties', k, 'id'] }))),
    window: list(s.windows ?? [], 'windows'),
  };
}

export function checkDuplicateIds(s: Scenario, out: IssueCollector): void {
  for (const [kind, entries] of Object.entries(idsByKind(s))) {
    const first = new Map<string, PathSegment[]>();
    for (const { id, path } of entries) {
      const earlier = first.get(id);
      if (earlier) out.error(path, `duplicate ${kind} id "${id}" (first used at ${jsonPath(earlier)})`);
      else first.set(id, path);
    }
  }
}

export function checkSpanEnds(s: Scenario, ix: ScenarioIndex, out: IssueCollector): void {
  s.spans.forEach((span, i) => {
    if (!ix.sites.has(span.a)) out.error(['spans', i, 'a'], `unknown site "${span.a}"`);
    if (!ix.sites.has(span.b)) out.error(['spans', i, 'b'], `unknown site "${span.b}"`);
    if (span.a === span.b) out.error(['spans', i, 'b'], `span joins site "${span.a}" to itself`);
  });
}

export function checkSliceRefs(s: Scenario, ix: ScenarioIndex, out: IssueCollector): void {
  s.slices.forEach((slice, i) => {
    if (!ix.tenants.has(slice.tenant)) out.error(['slices', i, 'tenant'], `unknown tenant "${slice.tenant}"`);
    const own = new Set(slice.functions.map((f) => f.id));
    slice.ties.forEach((tie, k) => {
      for (const end of ['from', 'to'] as const) {
        if (own.has(tie[end])) continue;
        const elsewhere = ix.functions.get(tie[end]);
        const message = elsewhere
          ? `function "${tie[end]}" belongs to slice "${elsewhere.slice}", not to slice "${slice.id}"`
          : `unknown function "${tie[end]}" (a tie joins two functions of its own slice)`;
        out.error(['slices', i, 'ties', k, end], message);
      }
    });
    slice.functions.forEach((fn, k) => {
      if (fn.anchor && 'site' in fn.anchor && !ix.sites.has(fn.anchor.site)) {
        out.error(['slices', i, 'functions', k, 'anchor', 'site'], `unknown site "${fn.anchor.site}"`);
      }
    });
  });
}

export function checkWindows(s: Scenario, ix: ScenarioIndex, out: IssueCollector): void {
  (s.windows ?? []).forEach((w, i) => {
    if (Date.parse(w.end) <= Date.parse(w.start)) {
      out.error(['windows', i, 'end'], `end ${w.end} must be after start ${w.start}`);
    }
    w.down.sites.forEach((id, j) => {
      if (!ix.sites.has(id)) out.error(['windows', i, 'down', 'sites', j], `unknown site "${id}"`);
    });
    w.down.spans.forEach((id, j) => {
      if (!ix.spans.has(id)) out.error(['windows', i, 'down', 'spans', j], `unknown span "${id}"`);
    });
    (w.reduced ?? []).forEach((r, j) => {
      if ('site' in r && !ix.sites.has(r.site)) out.error(['windows', i, 'reduced', j, 'site'], `unknown site "${r.site}"`);
      if ('span' in r && !ix.spans.has(r.span)) out.error(['windows', i, 'reduced', j, 'span'], `unknown span "${r.span}"`);
    });
  });
}
