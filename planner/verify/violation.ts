// The shape of one verification finding, shared by the plan checks.

export interface Violation {
  slice?: string;
  /**
   * Stable machine code. Entries: 'unknown-slice', 'duplicate-slice', 'missing-slice', 'extra-slice', and for
   * knock-on entries 'knock-on-target', 'knock-on-unresolved', 'knock-on-stays'. Placements: 'unknown-element',
   * 'missing-function', 'missing-tie', 'fixed-moved', 'anchor', 'down-element', 'broken-path', 'latency',
   * 'availability', 'outcome-mismatch'. Load: 'cpu-capacity', 'bandwidth-capacity'.
   */
  code: string;
  message: string;
}

export interface VerifyResult {
  ok: boolean;
  violations: Violation[];
}
