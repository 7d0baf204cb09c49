// Words and figures for an impact: risk as a percentage, the order slices are listed in.
import type { AffectedSlice, WindowImpact } from '@/shared/window-impact';

export const REASON_LABELS: Record<AffectedSlice['reasons'][number], string> = {
  hosted: 'Hosted',
  transit: 'Transit',
  squeezed: 'Squeezed',
  unprotected: 'Unprotected',
};

export const REASON_HINTS: Record<AffectedSlice['reasons'][number], string> = {
  hosted: 'a function sits on a site that goes down',
  transit: 'a link of the slice runs over equipment that goes down',
  squeezed: 'reduced capacity no longer fits it',
  unprotected: 'it loses its separate backup path',
};

/** "0.42 %", "< 0.01 %" for tiny but non-zero chances, "0 %" for none. */
export function formatRiskPercent(probability: number): string {
  if (!(probability > 0)) return '0 %';
  const percent = probability * 100;
  if (percent < 0.01) return '< 0.01 %';
  if (percent < 10) return `${percent.toFixed(2)} %`;
  return `${percent.toFixed(1)} %`;
}

/** Most severe first, for sorting. */
export const SEVERITY_RANK: Record<AffectedSlice['severity'], number> = { critical: 0, high: 1, medium: 2, low: 3 };

/** Critical slices first, then by severity, then the riskiest; ties by name so the order is stable. */
export function sortAffected(slices: readonly AffectedSlice[]): AffectedSlice[] {
  return [...slices].sort((a, b) =>
    Number(b.critical) - Number(a.critical)
    || SEVERITY_RANK[a.severity] - SEVERITY_RANK[b.severity]
    || b.failureProbability - a.failureProbability
    || a.name.localeCompare(b.name));
}

/** Sites and spans the affected slices use today, for the map's second highlight. */
export function affectedPathElements(impact: Pick<WindowImpact, 'currentPaths'>): { sites: string[]; spans: string[] } {
  const sites = new Set<string>();
  const spans = new Set<string>();
  for (const placement of impact.currentPaths) {
    Object.values(placement.sites).forEach((site) => sites.add(site));
    Object.values(placement.paths).forEach((path) => path.forEach((span) => spans.add(span)));
  }
  return { sites: [...sites], spans: [...spans] };
}

export function windowElementIds(impact: Pick<WindowImpact, 'elements'>): { sites: string[]; spans: string[] } {
  return {
    sites: impact.elements.filter((e) => e.kind === 'site').map((e) => e.id),
    spans: impact.elements.filter((e) => e.kind === 'span').map((e) => e.id),
  };
}

/**
 * Where Low…Critical come from (planner/impact/severity.ts): the slice itself, not its risk figure. A slice that
 * keeps running and only loses its backup path is rated one level lower.
 */
export const SEVERITY_SCALE =
  'Severity rates the slice, not the risk figure: Critical = public-safety, health or utility service; High = priority 1 or a latency-critical service (URLLC, V2X); Medium = priority 2–3; Low = priority 4–5; one level lower when it only loses its backup path.';

/** What the percentage beside each slice is. */
export const RISK_FIGURE_MEANING =
  'Risk = chance that equipment the slice still uses fails unplanned during the window, from each site’s and span’s mean time between failures.';
