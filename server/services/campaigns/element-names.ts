// The sites and spans of a search or a campaign group with the names a person reads, as the slot finder words them
// (sites by name, spans by their two ends).
import type { Queryable } from '../../../db/client';
import { currentInventory } from '../inventory/inventory-cache';
import { namedElements, namesOf, type NamedElement } from '../slots/slot-words';

export async function nameElements(db: Queryable, groups: { sites: string[]; spans: string[] }[]): Promise<NamedElement[][]> {
  const names = namesOf((await currentInventory(db)).scenario);
  return groups.map((g) => namedElements(names, g));
}
