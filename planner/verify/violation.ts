// The shape of one verification finding, shared by the plan checks.

export interface Violation {
  slice?: string;
  /** stable machine code, e.g. 'bandwidth-capacity', 'latency', 'fixed-moved' */
  code: string;
  message: string;
}

export interface VerifyResult {
  ok: boolean;
  violations: Violation[];
}
