// The sites and spans of a search or a campaign group with the names a person reads: sites by name, spans as
// "A – B" by their end sites' names (spans have no names of their own).
import type { Queryable } from '../../../db/client';
import type { Scenario } from '../../../shared/scenario';
import type { namedElementSchema } from '../../../shared/slots';
import type { z } from 'zod';
import { currentInventory } from '../inventory/inventory-cache';

export type NamedElement = z.infer<typeof namedElementSchema>;

export function namerOf(scenario: Scenario): (kind: 'site' | 'span', id: string) => NamedElement {
  const siteName = new Map(scenario.sites.map((s) => [s.id, s.name]));
  const spanEnds = new Map(scenario.spans.map((s) => [s.id, s]));
  return (kind, id) => {
    if (kind === 'site') return { kind, id, name: siteName.get(id) ?? 'a site no longer in the inventory' };
    const span = spanEnds.get(id);
    const name = span ? `${siteName.get(span.a) ?? span.a} – ${siteName.get(span.b) ?? span.b}` : 'a span no longer in the inventory';
    return { kind, id, name };
  };
}

export async function nameElements(db: Queryable, groups: { sites: string[]; spans: string[] }[]): Promise<NamedElement[][]> {
  const name = namerOf((await currentInventory(db)).scenario);
  return groups.map((g) => [...g.sites.map((id) => name('site', id)), ...g.spans.map((id) => name('span', id))]);
}
