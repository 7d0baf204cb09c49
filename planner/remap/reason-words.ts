// How an unresolved slice's reason names things: by what people call them (function and site names), never by
// internal ids, because the reason is read as it is on the plan review and the sign-off summary.
import type { FunctionInfo, SiteInfo, TieInfo } from '../model/types';

/** "the IoT gateway", or the id in quotes when the scenario gave the function no name. */
export function functionWords(f: Pick<FunctionInfo, 'id' | 'name'>): string {
  return f.name ? `the ${f.name}` : `function "${f.id}"`;
}

/** "the link between the IoT gateway and the core user plane". */
export function tieWords(t: Pick<TieInfo, 'from' | 'to'>, functions: readonly Pick<FunctionInfo, 'id' | 'name'>[]): string {
  return `the link between ${functionWords(functions[t.from])} and ${functionWords(functions[t.to])}`;
}

export function siteWords(site: Pick<SiteInfo, 'name'>): string {
  return `site ${site.name}`;
}
