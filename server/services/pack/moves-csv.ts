// The moves CSV for field teams: one row per make-before-break step, in order, by name, with when it is due.
// Reference: RFC 4180 (CSV: CRLF line ends, fields with comma, quote or line break quoted, quotes doubled).
import { csvText } from '../csv-text';
import type { PackStep } from '../../../shared/change-pack';

export const MOVES_CSV_COLUMNS = [
  'Order', 'Slice', 'Tenant', 'Function or link', 'Action', 'From site', 'To site', 'From path (sites in order)',
  'To path (sites in order)', 'Makes room for', 'Spare capacity', 'Planned time', 'After the window',
] as const;

export type MovesCsvWindow = { title: string; startsAt: Date; endsAt: Date; afterWindow: 'return' | 'keep' };

/** "Thu, 3 Dec 2026, 22:00 GMT-1": the day, the clock and the zone's name, as the notices write times. */
export function formatAtIn(at: Date, timeZone: string): string {
  const when = new Intl.DateTimeFormat('en-GB', {
    timeZone, weekday: 'short', day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit', hourCycle: 'h23',
  }).format(at);
  const zone = new Intl.DateTimeFormat('en-GB', { timeZone, timeZoneName: 'short' }).formatToParts(at).find((p) => p.type === 'timeZoneName');
  return `${when} ${zone?.value ?? timeZone}`;
}

function row(step: PackStep, w: MovesCsvWindow, timeZone: string): string[] {
  return [
    String(step.order), step.sliceName, step.tenantName, step.what,
    step.kind === 'move-function' ? 'Move function' : 'Reroute link',
    step.fromSite ?? '', step.toSite ?? '', step.fromPath ?? '', step.toPath ?? '',
    step.madeRoomFor.join('; '),
    step.needsSpare ? 'Needs temporary spare capacity' : 'Fits with old and new held at once',
    // Make-before-break: every step is in place before the work starts.
    `Before ${formatAtIn(w.startsAt, timeZone)}`,
    w.afterWindow === 'return' ? `Return after ${formatAtIn(w.endsAt, timeZone)}` : 'Stays where it moved',
  ];
}

/** The CSV text, header row first, guarded against spreadsheet formulas (services/csv-text.ts). */
export function movesCsv(steps: readonly PackStep[], w: MovesCsvWindow, timeZone: string): string {
  return csvText(MOVES_CSV_COLUMNS, steps.map((s) => row(s, w, timeZone)));
}

/** "moves-harbour-fibre-splice.csv": the window's title in lower-case ASCII words, or "moves-window.csv". */
export function movesFileName(title: string): string {
  const slug = title.normalize('NFKD').replace(/[\u0300-\u036f]/g, '').toLowerCase()
    .replace(/[^a-z0-9]+/g, '-').replace(/^-+|-+$/g, '').slice(0, 80).replace(/-+$/, '');
  return `moves-${slug || 'window'}.csv`;
}
