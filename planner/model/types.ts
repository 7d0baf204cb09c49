// Shared types of the planning engine: the compiled network, slices, windows and plans.
import type Graph from 'graphology';

export type SiteKind = 'core' | 'aggregation' | 'edge' | 'cell-site';

export interface SiteInfo {
  index: number;
  id: string;
  name: string;
  kind: SiteKind;
  lat: number;
  lon: number;
  cpu: number;
  availability: number;
  mtbfHours?: number;
}

export interface SpanInfo {
  index: number;
  id: string;
  /** site indices */
  a: number;
  b: number;
  capacityGbps: number;
  latencyMs: number;
  availability: number;
  mtbfHours?: number;
  srlg: string[];
}

/**
 * The physical network. `graph` is a graphology undirected multigraph keyed by site id
 * (edge keys = span ids); the arrays are the same data indexed for the typed-array kernels.
 * CSR adjacency: neighbours of site i are at adjStart[i] .. adjStart[i+1]-1.
 */
export interface NetworkModel {
  graph: Graph;
  sites: SiteInfo[];
  spans: SpanInfo[];
  siteIndex: Map<string, number>;
  spanIndex: Map<string, number>;
  adjStart: Int32Array;
  adjSite: Int32Array;
  adjSpan: Int32Array;
}

export type AnchorInfo = { site: number } | { lat: number; lon: number; radiusKm: number };

export interface FunctionInfo {
  id: string;
  /** what people call it ("IoT gateway"); reasons fall back to the id when a scenario has no name */
  name?: string;
  cpu: number;
  anchor?: AnchorInfo;
  moveCost: number;
  fixed: boolean;
}

export interface TieInfo {
  id: string;
  /** function indices within the slice */
  from: number;
  to: number;
  bandwidthGbps: number;
  maxLatencyMs: number;
  minAvailability?: number;
}

export interface SliceInfo {
  index: number;
  id: string;
  tenant: string;
  priority: number;
  critical: boolean;
  sst: number;
  functions: FunctionInfo[];
  ties: TieInfo[];
}

/** Where one slice lives: site index per function, span indices per tie (ordered from `from`'s site). */
export interface SlicePlacement {
  sites: number[];
  paths: number[][];
}

/** Compiled scenario: network, slices and their current placements (placements[i] belongs to slices[i]). */
export interface Inventory {
  network: NetworkModel;
  slices: SliceInfo[];
  sliceIndex: Map<string, number>;
  placements: SlicePlacement[];
}

export interface WindowSpec {
  id: string;
  downSites: string[];
  downSpans: string[];
  reduced: ({ site: string; fraction: number } | { span: string; fraction: number })[];
  /** Duration in hours, for risk figures. */
  durationHours?: number;
}

/** Capacity already promised elsewhere (e.g. accepted plans of overlapping windows). */
export interface Reservation {
  siteCpu?: Record<string, number>;
  spanGbps?: Record<string, number>;
}

export type Outcome = 'stays' | 'reroute' | 'move' | 'unresolved';

export interface SlicePlan {
  slice: string;
  outcome: Outcome;
  /** function id → site id; empty when unresolved */
  sites: Record<string, string>;
  /** tie id → span ids in order from the `from` function's site; empty when unresolved */
  paths: Record<string, string[]>;
  /** why a slice is unresolved (which constraint), for the review screen */
  reason?: string;
  /**
   * Knock-on move: the window does not touch this slice, but moving or rerouting it frees room that keeps
   * these touched slices (ids) in service. Absent on the window's own affected slices.
   */
  madeRoomFor?: string[];
}

/** Lexicographic objective, compared in this order (DESIGN §4.2). */
export interface Objective {
  /** Σ (6 − priority) over unresolved slices: priority 1 weighs 5, priority 5 weighs 1 */
  unresolvedWeight: number;
  unresolved: number;
  moved: number;
  rerouted: number;
  /** Σ moveCost of moved functions + REROUTE_COST × changed ties */
  moveCost: number;
  /** Σ bandwidth × path latency (Gbit/s·ms) */
  usage: number;
  /** highest span utilisation during the window, 0..1+ */
  peakUtilisation: number;
}

export interface TracePoint {
  generation: number;
  evaluations: number;
  best: Objective;
  feasible: boolean;
}

export type PlanMode = 'serial' | 'islands' | 'shared-eval' | 'greedy' | 'exact';

export interface PlanResult {
  window: string;
  mode: PlanMode;
  seed: number;
  elapsedMs: number;
  affected: string[];
  slices: SlicePlan[];
  objective: Objective;
  trace: TracePoint[];
  /** exact mode: proven optimum or not, and the relative gap to the best bound */
  exact?: { optimal: boolean; gap: number; bound: number };
  /**
   * DE modes: what the search alone found, before any fallback. `usedFallback` names the plan returned instead
   * when the search's own was worse or infeasible (the product keeps the better plan; the figures stay honest).
   */
  search?: { objective: Objective; feasible: boolean; usedFallback: 'greedy' | null };
  /**
   * DE modes: the greedy plan the search started from, scored as a greedy-mode run would score it (same problem),
   * and the time such a run would take (building the problem, greedy, scoring). It serves as the greedy reference
   * without solving the window a second time.
   */
  greedy?: { objective: Objective; elapsedMs: number };
  /**
   * DE modes: why the search ended — its generation budget, its stall limit, or its time limit (at any phase:
   * seed polish, evolution, final polish). Only a time stop makes the plan depend on the machine's speed and load.
   */
  stoppedBy?: 'generations' | 'stall' | 'time';
  /** DE modes: generations evolved */
  generations?: number;
}
