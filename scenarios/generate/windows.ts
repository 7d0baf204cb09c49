// A month of maintenance windows from 3 December 2026 on the invented coast's local time (UTC−1).
// Windows 6 and 7 overlap in time and both take down the same span: the demo's built-in conflict.
import type { ScenarioSite, ScenarioSpan, ScenarioWindow } from '../../shared/scenario';

const OFFSET = '-01:00';
const at = (date: string, time: string): string => `${date}T${time}:00${OFFSET}`;

interface Picks {
  site: (kind: ScenarioSite['kind'], n: number) => ScenarioSite;
  span: (between: [string, string] | number) => ScenarioSpan;
}

function picker(sites: ScenarioSite[], spans: ScenarioSpan[]): Picks {
  return {
    site: (kind, n) => sites.filter((s) => s.kind === kind)[n],
    span: (which) => {
      if (typeof which === 'number') return spans[which];
      const [a, b] = which.map((name) => sites.find((s) => s.name === name)!.id);
      return spans.find((s) => (s.a === a && s.b === b) || (s.a === b && s.b === a))!;
    },
  };
}

const siteName = (sites: ScenarioSite[], id: string): string => sites.find((s) => s.id === id)!.name;
const spanTitle = (sites: ScenarioSite[], s: ScenarioSpan): string => `${siteName(sites, s.a)}–${siteName(sites, s.b)}`;

export function makeWindows(sites: ScenarioSite[], spans: ScenarioSpan[]): ScenarioWindow[] {
  const p = picker(sites, spans);
  const none = { sites: [] as string[], spans: [] as string[] };
  const siteDown = (s: ScenarioSite) => ({ sites: [s.id], spans: [] as string[] });
  const spanDown = (...s: ScenarioSpan[]) => ({ sites: [] as string[], spans: s.map((x) => x.id) });
  const ringSpan = p.span(['Drennock', 'Brisk Harbour']);
  // The two spans in Drennock's shared duct: one is spliced, then the duct repair takes both.
  const [conflictSpan, twinSpan] = spans.filter((s) => s.srlg?.includes('duct-drennock'));
  const rows: [string, string, string, string, string, ScenarioWindow['down'], ScenarioWindow['reduced']?][] = [
    ['Router software upgrade', 'software upgrade', at('2026-12-03', '22:00'), at('2026-12-04', '02:00'), p.site('edge', 1).name, siteDown(p.site('edge', 1))],
    ['Fibre splice', 'fibre splice', at('2026-12-05', '01:00'), at('2026-12-05', '05:00'), spanTitle(sites, ringSpan), spanDown(ringSpan)],
    ['Power work on the rectifier', 'power work', at('2026-12-08', '23:00'), at('2026-12-09', '03:30'), p.site('aggregation', 6).name, siteDown(p.site('aggregation', 6))],
    ['Antenna and radio replacement', 'hardware replacement', at('2026-12-10', '09:00'), at('2026-12-10', '13:00'), p.site('cell-site', 4).name, siteDown(p.site('cell-site', 4))],
    ['Core router software upgrade (one plane at a time)', 'software upgrade', at('2026-12-11', '00:30'), at('2026-12-11', '04:30'), p.site('core', 1).name, none,
      [{ site: p.site('core', 1).id, fraction: 0.5 }]],
    ['Fibre splice after road works', 'fibre splice', at('2026-12-14', '22:00'), at('2026-12-15', '04:00'), spanTitle(sites, conflictSpan), spanDown(conflictSpan)],
    ['Duct repair in the shared trench', 'duct repair', at('2026-12-15', '01:00'), at('2026-12-15', '06:00'), 'Drennock', spanDown(conflictSpan, twinSpan)],
    ['Line card replacement', 'hardware replacement', at('2026-12-17', '23:00'), at('2026-12-18', '03:00'), spanTitle(sites, p.span(2)), none,
      [{ span: p.span(2).id, fraction: 0.5 }]],
    ['Edge compute software upgrade', 'software upgrade', at('2026-12-21', '02:00'), at('2026-12-21', '06:00'), p.site('edge', 7).name, siteDown(p.site('edge', 7))],
    ['Generator test and power work', 'power work', at('2026-12-23', '22:30'), at('2026-12-24', '02:30'), p.site('cell-site', 15).name, siteDown(p.site('cell-site', 15))],
    ['Fibre splice', 'fibre splice', at('2026-12-28', '00:00'), at('2026-12-28', '04:00'), spanTitle(sites, p.span(40)), spanDown(p.span(40))],
    ['Battery replacement', 'power work', at('2027-01-02', '01:00'), at('2027-01-02', '05:00'), p.site('edge', 4).name, siteDown(p.site('edge', 4))],
  ];
  return rows.map(([title, workType, start, end, where, down, reduced], i) => {
    const w: ScenarioWindow = { id: `w-${String(i + 1).padStart(2, '0')}`, title: `${title}, ${where}`, start, end, down, workType };
    if (reduced) w.reduced = reduced;
    return w;
  });
}
