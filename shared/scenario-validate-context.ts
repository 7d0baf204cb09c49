// Shared plumbing for scenario validation: JSON paths, the issue collector and the id indexes.
import type { Scenario, ScenarioFunction, ScenarioSite, ScenarioSlice, ScenarioSpan, ScenarioTie } from './scenario';

export interface ScenarioIssue {
  path: string;
  message: string;
}

export type PathSegment = string | number;

const PLAIN_KEY = /^[A-Za-z_$][A-Za-z0-9_$]*$/;

/** `$.slices[3].ties[0].from`; keys that are not plain identifiers are quoted: `$.placements[0].sites['fn-1']`. */
export function jsonPath(segments: readonly PathSegment[]): string {
  return segments.reduce<string>((path, s) => {
    if (typeof s === 'number') return `${path}[${s}]`;
    if (PLAIN_KEY.test(s)) return `${path}.${s}`;
    return `${path}['${s.replace(/\\/g, '\\\\').replace(/'/g, "\\'")}']`;
  }, '$');
}

export class IssueCollector {
  readonly errors: ScenarioIssue[] = [];
  readonly warnings: ScenarioIssue[] = [];
  error(path: readonly PathSegment[], message: string): void {
    this.errors.push({ path: jsonPath(path), message });
  }
  warn(path: readonly PathSegment[], message: string): void {
    this.warnings.push({ path: jsonPath(path), message });
  }
}

export interface Located<T> {
  value: T;
  path: PathSegment[];
}

/** First occurrence of every id; duplicates are reported separately and ignored here. */
export interface ScenarioIndex {
  sites: Map<string, Located<ScenarioSite>>;
  spans: Map<string, Located<ScenarioSpan>>;
  tenants: Set<string>;
  slices: Map<string, Located<ScenarioSlice>>;
  functions: Map<string, Located<ScenarioFunction> & { slice: string }>;
  ties: Map<string, Located<ScenarioTie> & { slice: string }>;
}

function firstById<T extends { id: string }>(items: readonly T[], key: string): Map<string, Located<T>> {
  const map = new Map<string, Located<T>>();
  items.forEach((value, i) => {
    if (!map.has(value.id)) map.set(value.id, { value, path: [key, i] });
  });
  return map;
}

export function buildIndex(s: Scenario): ScenarioIndex {
  const functions: ScenarioIndex['functions'] = new Map();
  const ties: ScenarioIndex['ties'] = new Map();
  s.slices.forEach((slice, i) => {
    slice.functions.forEach((value, k) => {
      if (!functions.has(value.id)) functions.set(value.id, { value, path: ['slices', i, 'functions', k], slice: slice.id });
    });
    slice.ties.forEach((value, k) => {
      if (!ties.has(value.id)) ties.set(value.id, { value, path: ['slices', i, 'ties', k], slice: slice.id });
    });
  });
  return {
    sites: firstById(s.sites, 'sites'),
    spans: firstById(s.spans, 'spans'),
    tenants: new Set(s.tenants.map((t) => t.id)),
    slices: firstById(s.slices, 'slices'),
    functions,
    ties,
  };
}
