// Removals the target would make but must not: elements that placements or open windows still use, tenants with accounts.
import type { Queryable } from '../../db/client';
import type { ImportIssue } from '../../shared/imports';
import type { Scenario } from '../../shared/scenario';
import { selectUsersOfTenants } from '../queries/auth/tenant-users';
import { selectWindowsUsingElements } from '../queries/windows/elements';
import type { ScenarioDiff } from './diff';

const CLOSED_WINDOW_STATES = ['done', 'rolled-back', 'withdrawn'] as const;

/** Slice ids (in the target) using each removed site or span. */
function slicesUsing(target: Scenario, removedSites: Set<string>, removedSpans: Set<string>): Map<string, Set<string>> {
  const users = new Map<string, Set<string>>();
  const add = (element: string, slice: string) => users.set(element, (users.get(element) ?? new Set()).add(slice));
  for (const p of target.placements) {
    for (const site of Object.values(p.sites)) if (removedSites.has(site)) add(site, p.slice);
    for (const path of Object.values(p.paths)) for (const span of path) if (removedSpans.has(span)) add(span, p.slice);
  }
  for (const slice of target.slices) {
    for (const f of slice.functions) if (f.anchor && 'site' in f.anchor && removedSites.has(f.anchor.site)) add(f.anchor.site, slice.id);
  }
  return users;
}

export async function removalErrors(db: Queryable, target: Scenario, diff: ScenarioDiff, fileName: string): Promise<ImportIssue[]> {
  const errors: ImportIssue[] = [];
  const removedSites = new Set(diff.sites.removes);
  const removedSpans = new Set(diff.spans.removes);
  for (const [element, slices] of slicesUsing(target, removedSites, removedSpans)) {
    const what = removedSites.has(element) ? 'site' : 'span';
    errors.push({ file: fileName, path: `${what}s[${element}]`, message: `${what} "${element}" would be removed, but current placements use it: slices ${[...slices].sort().join(', ')}` });
  }
  const elements = [...removedSites, ...removedSpans];
  if (elements.length > 0) {
    const open = await selectWindowsUsingElements(db, elements, CLOSED_WINDOW_STATES);
    for (const w of open) errors.push({ file: fileName, message: `"${w.elementId}" would be removed, but maintenance window "${w.windowId}" (not yet done) takes it out` });
  }
  if (diff.tenants.removes.length > 0) {
    const accounts = await selectUsersOfTenants(db, diff.tenants.removes);
    for (const tenantId of new Set(accounts.map((a) => a.tenantId))) {
      const n = accounts.filter((a) => a.tenantId === tenantId).length;
      errors.push({ file: fileName, path: `tenants[${tenantId}]`, message: `tenant "${tenantId}" would be removed, but ${n} user account(s) belong to it` });
    }
  }
  return errors;
}
