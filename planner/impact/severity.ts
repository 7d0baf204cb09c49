// Severity of an affected slice from its SST, priority and critical flag (DESIGN §3, §4.3).
import type { SliceInfo } from '../model/types';

export type Severity = 'low' | 'medium' | 'high' | 'critical';

const LEVELS: Severity[] = ['low', 'medium', 'high', 'critical'];

/** 3GPP TS 23.501 Table 5.15.2.2-1: SST 2 = URLLC and 4 = V2X carry latency-critical traffic. */
const LATENCY_CRITICAL_SST = new Set([2, 4]);

/** critical flag → critical; priority 1 or URLLC/V2X → high; priority 2–3 → medium; else low. */
export function baseSeverity(slice: SliceInfo): Severity {
  if (slice.critical) return 'critical';
  if (slice.priority <= 1 || LATENCY_CRITICAL_SST.has(slice.sst)) return 'high';
  if (slice.priority <= 3) return 'medium';
  return 'low';
}

/** One level lower when service continues and only protection is lost. */
export function sliceSeverity(slice: SliceInfo, serviceHit: boolean): Severity {
  const base = LEVELS.indexOf(baseSeverity(slice));
  return LEVELS[serviceHit ? base : Math.max(0, base - 1)];
}
