// The demo network while slices are being placed: adjacency, what is booked so far, and a tiny Dijkstra.
import type { ScenarioSite, ScenarioSpan } from '../../shared/scenario';
import { elementAvailability, spanLatencyMs } from '../../shared/scenario';

/** WARNING: demo placements stop at this share of any capacity, so the demo starts with slack for maintenance. */
export const MAX_UTILISATION = 0.7;

export interface Route {
  spans: string[];
  latencyMs: number;
  /** Series availability of every span and site on the route, ends included (the strictest reading). */
  availability: number;
}

export class DemoNetwork {
  readonly site = new Map<string, ScenarioSite>();
  readonly span = new Map<string, ScenarioSpan>();
  readonly cpuUsed = new Map<string, number>();
  readonly gbpsUsed = new Map<string, number>();
  private readonly adjacent = new Map<string, ScenarioSpan[]>();

  constructor(readonly sites: ScenarioSite[], readonly spans: ScenarioSpan[]) {
    for (const s of sites) {
      this.site.set(s.id, s);
      this.adjacent.set(s.id, []);
    }
    for (const sp of spans) {
      this.span.set(sp.id, sp);
      this.adjacent.get(sp.a)!.push(sp);
      this.adjacent.get(sp.b)!.push(sp);
    }
  }

  cpuFree(siteId: string): number {
    return this.site.get(siteId)!.cpu * MAX_UTILISATION - (this.cpuUsed.get(siteId) ?? 0);
  }

  gbpsFree(spanId: string): number {
    return this.span.get(spanId)!.capacityGbps * MAX_UTILISATION - (this.gbpsUsed.get(spanId) ?? 0);
  }

  bookCpu(siteId: string, cpu: number): void {
    this.cpuUsed.set(siteId, (this.cpuUsed.get(siteId) ?? 0) + cpu);
  }

  bookRoute(route: Route, gbps: number): void {
    for (const id of route.spans) this.gbpsUsed.set(id, (this.gbpsUsed.get(id) ?? 0) + gbps);
  }

  /** Dijkstra by latency over spans with at least `gbps` free; O(V²) is plenty for ~50 sites. */
  shortest(from: string, gbps = 0): Map<string, { latencyMs: number; via: ScenarioSpan | null }> {
    const best = new Map([[from, { latencyMs: 0, via: null as ScenarioSpan | null }]]);
    const done = new Set<string>();
    for (;;) {
      let here: string | null = null;
      for (const [id, b] of best) if (!done.has(id) && (here === null || b.latencyMs < best.get(here)!.latencyMs)) here = id;
      if (here === null) return best;
      done.add(here);
      for (const sp of this.adjacent.get(here)!) {
        if (this.gbpsFree(sp.id) < gbps) continue;
        const next = sp.a === here ? sp.b : sp.a;
        const latencyMs = best.get(here)!.latencyMs + spanLatencyMs(sp);
        if (!best.has(next) || latencyMs < best.get(next)!.latencyMs) best.set(next, { latencyMs, via: sp });
      }
    }
  }

  route(from: string, to: string, gbps: number): Route | null {
    const tree = this.shortest(from, gbps);
    if (!tree.has(to)) return null;
    const spans: string[] = [];
    let availability = elementAvailability(this.site.get(to)!);
    for (let at = to; at !== from; ) {
      const via = tree.get(at)!.via!;
      spans.unshift(via.id);
      at = via.a === at ? via.b : via.a;
      availability *= elementAvailability(via) * elementAvailability(this.site.get(at)!);
    }
    return { spans, latencyMs: tree.get(to)!.latencyMs, availability };
  }
}
