// Words of the slot finder: names for sites, spans, slices and tenants (people read names, never ids), the
// reasons a slot is excluded, the clash reasons between two groups, and each candidate's one-line explanation.
import type { Scenario } from '../../../shared/scenario';
import type { WindowConflict } from '../../../shared/window-impact';
import { formatRangeIn } from '../notices/notice-times';

export interface SlotNames {
  site: (id: string) => string;
  span: (id: string) => string;
  slice: (id: string) => string;
  tenant: (id: string) => string;
}

/**
 * Names from the scenario the inventory was compiled from; a span is called by its two ends ("Ring 2 – Ring 3"), as
 * the change-board pack and the sign-off summary call it. Something no longer in the inventory is said so, never by id.
 */
export function namesOf(scenario: Pick<Scenario, 'sites' | 'spans' | 'slices' | 'tenants'>): SlotNames {
  const sites = new Map(scenario.sites.map((s) => [s.id, s.name]));
  const site = (id: string) => sites.get(id) ?? 'a site no longer in the inventory';
  const spans = new Map(scenario.spans.map((s) => [s.id, `${site(s.a)} – ${site(s.b)}`]));
  const slices = new Map(scenario.slices.map((s) => [s.id, s.name]));
  const tenants = new Map(scenario.tenants.map((t) => [t.id, t.name]));
  return {
    site,
    span: (id) => spans.get(id) ?? 'a span no longer in the inventory',
    slice: (id) => slices.get(id) ?? 'a slice no longer in the inventory',
    tenant: (id) => tenants.get(id) ?? 'a tenant no longer in the inventory',
  };
}

export type NamedElement = { kind: 'site' | 'span'; id: string; name: string };

/** A group's sites and spans with their names, sites first: what the screens head a search or a campaign window with. */
export function namedElements(names: SlotNames, group: { sites: readonly string[]; spans: readonly string[] }): NamedElement[] {
  return [
    ...group.sites.map((id): NamedElement => ({ kind: 'site', id, name: names.site(id) })),
    ...group.spans.map((id): NamedElement => ({ kind: 'span', id, name: names.span(id) })),
  ];
}

/** "A, B and C"; long lists end with "and N more". */
export function listWords(items: readonly string[], max = 4): string {
  if (items.length <= 1) return items.join('');
  if (items.length > max) return `${items.slice(0, max).join(', ')} and ${items.length - max} more`;
  return `${items.slice(0, -1).join(', ')} and ${items[items.length - 1]}`;
}

const plural = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;

/** An element key as pair-conflicts writes it ("site:R2", "span:r23") in words ("site Ring 2"). */
function elementWords(key: string, names: SlotNames): string {
  const [kind, ...rest] = key.split(':');
  const id = rest.join(':');
  return kind === 'site' ? `site ${names.site(id)}` : `span ${names.span(id)}`;
}

/** One pair-conflicts reason in words a person reads (names, not ids). */
export function conflictReasonWords(r: WindowConflict['reasons'][number], names: SlotNames): string {
  if (r.reason === 'shared-element') return `both take out ${listWords(r.ids.map((k) => elementWords(k, names)))}`;
  if (r.reason === 'strands-slice') {
    return `together they cut off ${r.ids.length === 1 ? 'the slice' : 'the slices'} ${listWords(r.ids.map((id) => `"${names.slice(id)}"`))}`;
  }
  const parts = /into (\d+) parts/.exec(r.message)?.[1];
  return parts ? `together they split the network into ${parts} parts` : 'together they split the network';
}

export function freezeReason(f: { title: string; startsAt: Date; endsAt: Date }, timeZone: string): string {
  return `Inside the freeze "${f.title}" (${formatRangeIn(f.startsAt, f.endsAt, timeZone)}).`;
}

export function conflictReason(w: { title: string }, reasons: readonly string[]): string {
  return `Conflicts with the window "${w.title}": ${reasons.join('; ')}.`;
}

export function leadTimeReason(tenant: string, leadDays: number, daysLeft: number): string {
  const left = daysLeft <= 0 ? 'the start is already past' : `only ${formatDays(daysLeft)} are left before the start`;
  return `${tenant} must be told ${plural(leadDays, 'day')} ahead; ${left}.`;
}

export function strandedReason(slices: readonly string[]): string {
  return slices.length === 1
    ? `The quick re-map finds no place for the critical slice "${slices[0]}".`
    : `The quick re-map finds no place for the critical slices ${listWords(slices.map((s) => `"${s}"`))}.`;
}

/** Days with one decimal below 10 ("3.5 days"), whole days above. */
export function formatDays(days: number): string {
  const shown = days < 10 ? Math.floor(days * 10) / 10 : Math.floor(days);
  return `${shown} ${shown === 1 ? 'day' : 'days'}`;
}

export function formatPercent(percent: number): string {
  if (!(percent > 0)) return '0 %';
  if (percent < 0.01) return '< 0.01 %';
  return percent < 10 ? `${percent.toFixed(2)} %` : `${percent.toFixed(1)} %`;
}

export type ExplanationFacts = {
  touched: number; criticalTouched: number; unresolved: number; riskPercent: number; riskLevel: string;
  overlapping: readonly string[]; noticeSpareDays: number | null; reused: boolean;
};

/** Why a usable slot ranks where it does, in one line. */
export function explain(f: ExplanationFacts): string {
  const parts: string[] = [];
  if (f.touched === 0) parts.push('Touches no slice');
  else {
    const critical = f.criticalTouched > 0 ? ` (${f.criticalTouched} critical)` : '';
    parts.push(`Touches ${plural(f.touched, 'slice')}${critical}`);
    parts.push(f.unresolved === 0 ? 'the quick re-map keeps every one' : `the quick re-map cannot keep ${f.unresolved}`);
    parts.push(`risk of failure ${formatPercent(f.riskPercent)} (slices up to ${f.riskLevel} severity)`);
  }
  if (f.overlapping.length > 0) {
    parts.push(`${f.overlapping.length === 1 ? 'the window' : 'the windows'} ${listWords(f.overlapping.map((t) => `"${t}"`))} also out`);
  }
  if (f.noticeSpareDays !== null) parts.push(`${formatDays(f.noticeSpareDays)} of notice to spare`);
  return `${parts.join('; ')}.`;
}
