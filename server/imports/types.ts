// What each parser hands to the merge step, and the issue lists every step adds to.
import type { ImportIssue } from '../../shared/imports';
import type { Scenario, ScenarioSite, ScenarioSlice, ScenarioSpan, ScenarioPlacement } from '../../shared/scenario';

export type Issues = { errors: ImportIssue[]; warnings: ImportIssue[] };

/** A GraphML node: the values its keys gave; what is missing is filled from the current site or reported. */
export type GraphmlSite = { id: string; given: Partial<ScenarioSite> };
export type GraphmlSpan = { id: string; given: Partial<ScenarioSpan> & { a: string; b: string } };
/** Attribute names found on the file's nodes and edges, and our field → the attribute it was read from. */
export type GraphmlNames = {
  attributes: { site: string[]; span: string[] };
  recognised: { site: Record<string, string>; span: Record<string, string> };
};

/** One slice from the slices CSV: its attributes, and when function rows were given, its whole new body. */
export type CsvSlice = {
  attrs: Omit<ScenarioSlice, 'functions' | 'ties'> | null;
  sliceId: string;
  /** first row of the slice in the file (for messages) */
  row: number;
  body: { functions: ScenarioSlice['functions']; ties: ScenarioSlice['ties']; placement: ScenarioPlacement } | null;
};

export type ParsedContent =
  | { kind: 'scenario'; scenario: Scenario | null }
  | { kind: 'graphml'; sites: GraphmlSite[]; spans: GraphmlSpan[]; names: GraphmlNames }
  | { kind: 'csv-sites'; sites: ScenarioSite[] }
  | { kind: 'csv-spans'; spans: ScenarioSpan[] }
  | { kind: 'csv-slices'; slices: CsvSlice[] };

export type ParsedImport = Issues & { content: ParsedContent };
