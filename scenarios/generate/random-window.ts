// Random maintenance windows of 1–5 elements (sites or spans, down or reduced) for tests and benchmarks.
import type { Scenario, ScenarioWindow } from '../../shared/scenario';
import { randomInt, type Rng } from '../../planner/random/rng';

export interface RandomWindowOptions {
  /** element count; drawn from 1–5 when omitted */
  elements?: number;
  /** chance an element is reduced instead of down */
  reducedShare?: number;
  /** chance an element is picked among those carrying slices (else among all) */
  loadedShare?: number;
  /** day offset for the window's date */
  day?: number;
}

function usedElements(scenario: Scenario): { sites: string[]; spans: string[] } {
  const sites = new Set<string>();
  const spans = new Set<string>();
  for (const p of scenario.placements) {
    for (const s of Object.values(p.sites)) sites.add(s);
    for (const path of Object.values(p.paths)) for (const s of path) spans.add(s);
  }
  return { sites: [...sites].sort(), spans: [...spans].sort() };
}

const pad = (n: number) => String(n).padStart(2, '0');

/** 22:00–02:00 local (UTC+01:00) night-work slot, `day` days after 1 March 2030. */
function nightSlot(day: number): { start: string; end: string } {
  const start = new Date(Date.UTC(2030, 2, 1 + day, 21, 0));
  const end = new Date(start.getTime() + 4 * 3_600_000);
  const local = (d: Date) => {
    const l = new Date(d.getTime() + 3_600_000);
    return `${l.getUTCFullYear()}-${pad(l.getUTCMonth() + 1)}-${pad(l.getUTCDate())}T${pad(l.getUTCHours())}:00:00+01:00`;
  };
  return { start: local(start), end: local(end) };
}

export function randomWindow(scenario: Scenario, rng: Rng, id: string, options: RandomWindowOptions = {}): ScenarioWindow {
  const count = options.elements ?? 1 + randomInt(rng, 5);
  const used = usedElements(scenario);
  const all = { sites: scenario.sites.map((s) => s.id), spans: scenario.spans.map((s) => s.id) };
  const picked = new Set<string>();
  const window: ScenarioWindow = { id, title: `Planned work ${id}`, ...nightSlot(options.day ?? 0), down: { sites: [], spans: [] }, reduced: [] };
  for (let attempt = 0; picked.size < count && attempt < 50 * count; attempt += 1) {
    const pool = rng() < (options.loadedShare ?? 0.8) ? used : all;
    const isSite = rng() < 0.4;
    const list = isSite ? pool.sites : pool.spans;
    if (list.length === 0) continue;
    const element = list[randomInt(rng, list.length)];
    if (picked.has(element)) continue;
    picked.add(element);
    if (rng() < (options.reducedShare ?? 0.2)) {
      const fraction = Math.round((0.3 + rng() * 0.5) * 100) / 100;
      window.reduced!.push(isSite ? { site: element, fraction } : { span: element, fraction });
    } else {
      (isSite ? window.down.sites : window.down.spans).push(element);
    }
  }
  return window;
}
