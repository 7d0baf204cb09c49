// A window's impact from the planner (affected slices, splits, overloads) plus per-slice risk, in API shape.
import { assessImpact } from '../../../planner/impact/assess-impact';
import type { Inventory } from '../../../planner/model/types';
import { sliceRisk } from '../../../planner/risk/slice-risk';
import type { Scenario } from '../../../shared/scenario';
import type { AffectedSlice, WindowImpact } from '../../../shared/window-impact';
import type { ElementRow } from '../../queries/windows/window-rows';
import { windowSpecOf } from './window-spec';

export type ImpactSubject = { id: string; version: number; startsAt: Date; endsAt: Date; elements: ElementRow[] };

export function computeWindowImpact(scenario: Scenario, inv: Inventory, w: ImpactSubject, now: Date): WindowImpact {
  const spec = windowSpecOf(w);
  const report = assessImpact(inv, spec);
  // Stay-put risk: each slice where it sits today, so the figure shows what doing nothing would risk.
  const risks = new Map(sliceRisk(inv, spec, new Map()).map((r) => [r.slice, r]));
  const sliceMeta = new Map(scenario.slices.map((s) => [s.id, s]));
  const tenantNames = new Map(scenario.tenants.map((t) => [t.id, t.name]));
  const affected: AffectedSlice[] = report.affected.map((a) => {
    const s = sliceMeta.get(a.slice)!;
    const risk = risks.get(a.slice);
    return {
      slice: a.slice, name: s.name,
      tenant: { id: s.tenant, name: tenantNames.get(s.tenant) ?? s.tenant },
      sst: s.sst, priority: s.priority, critical: s.critical ?? false,
      reasons: a.reasons, severity: a.severity,
      failureProbability: risk?.failureProbability ?? 0,
      unprotected: a.reasons.includes('unprotected') || (risk?.unprotected ?? false),
    };
  });
  const affectedIds = new Set(affected.map((a) => a.slice));
  return {
    windowId: w.id, windowVersion: w.version, computedAt: now.toISOString(),
    affected,
    touchesCritical: affected.some((a) => a.critical),
    splits: report.splits, components: report.components,
    overloaded: report.overloaded,
    elements: w.elements,
    currentPaths: scenario.placements.filter((p) => affectedIds.has(p.slice))
      .map((p) => ({ slice: p.slice, sites: p.sites, paths: p.paths })),
  };
}
