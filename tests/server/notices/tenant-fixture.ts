// Tenant-view fixture on top of the notices harness: a notified window carrying every internal field (owner, notes,
// MOP, freeze-override reason, an internal title), a cleared window nobody was told of, one whose notices are held
// back for lead time, a site and span outside every tenant's footprint, and a tenant user without a tenant.
import { eq } from 'drizzle-orm';
import { sites, spans, windowDocuments, windows } from '../../../db/schema';
import { issueNotices } from '../../../server/services/notices/issue-notices';
import { signedInRequests, type AsUser } from '../helpers/sign-in';
import { insertUser } from '../helpers/test-app';
import { insertClearedWindow, NOW, setupNoticesApp, type NoticesContext } from './fixture';

export type TenantWho = 'tenant' | 'otherTenant' | 'tenantless';
export const TENANT_USERS: readonly TenantWho[] = ['tenant', 'otherTenant', 'tenantless'];

export type TenantViewsContext = NoticesContext & {
  /** notified to both tenants */
  notified: string;
  /** cleared, no notice issued yet */
  unnotified: string;
  /** notices issued but held back for lead time (blocked) */
  blocked: string;
  /** internal values of the notified window that no tenant answer may carry */
  internals: { title: string; ownerName: string; notes: string; mopFileName: string; overrideReason: string; elementIds: string[] };
  asTenant: AsUser<TenantWho>;
};

export async function setupTenantViews(): Promise<TenantViewsContext> {
  const ctx = await setupNoticesApp();
  const issue = (windowId: string) => ctx.db.transaction((tx) =>
    issueNotices(tx, { jobs: ctx.queue, config: ctx.config, now: NOW }, windowId, ctx.users.approver.id));
  await ctx.db.insert(sites).values({ id: ctx.id('X4'), name: 'Hidden Point X4', kind: 'edge', lat: 10.2, lon: 10.2, cpu: 16 });
  await ctx.db.insert(spans).values({
    id: ctx.id('s4'), siteA: ctx.id('X3'), siteB: ctx.id('X4'), capacityGbps: 10, lengthKm: 10, latencyMs: 1,
  });
  const notified = await insertClearedWindow(ctx, 'notified', 25);
  const unnotified = await insertClearedWindow(ctx, 'unnotified', 26);
  const blocked = await insertClearedWindow(ctx, 'blocked', 3);
  const internals = {
    title: `Fibre splice, Hidden Point X1 to Hidden Point X2 (${ctx.prefix})`,
    ownerName: `User ${ctx.users.engineer.id}`,
    notes: `Internal note ${ctx.prefix}: key at the gatehouse`,
    mopFileName: `mop-${ctx.prefix}-splice.pdf`,
    overrideReason: `Override ${ctx.prefix}: the splice cannot wait`,
    elementIds: [ctx.id('X1')],
  };
  for (const id of [notified, unnotified, blocked]) {
    await ctx.db.update(windows).set({
      ownerId: ctx.users.engineer.id, notes: internals.notes, freezeOverrideReason: internals.overrideReason,
    }).where(eq(windows.id, id));
    await ctx.db.insert(windowDocuments).values({
      windowId: id, fileName: internals.mopFileName, mime: 'application/pdf', sizeBytes: 3, content: Buffer.from('pdf'),
    });
  }
  await issue(notified);
  await issue(blocked);
  const tenantless = { id: `${ctx.prefix}-nobody`, email: `nobody.${ctx.prefix}@test.example` };
  await insertUser(ctx.db, { ...tenantless, name: 'Tenantless user', tenantId: null, roles: ['tenant'] });
  const emails: Record<TenantWho, string> = {
    tenant: ctx.users.tenant.email, otherTenant: ctx.otherTenantUser.email, tenantless: tenantless.email,
  };
  const app = ctx.makeApp({ now: () => NOW, jobs: ctx.queue });
  return { ...ctx, notified, unnotified, blocked, internals, asTenant: signedInRequests(app, (who: TenantWho) => emails[who]) };
}

/** Every key and every string or number value in a JSON answer, however deep. */
export function keysAndValues(body: unknown, out = { keys: new Set<string>(), values: [] as string[] }) {
  if (Array.isArray(body)) body.forEach((x) => keysAndValues(x, out));
  else if (body && typeof body === 'object') {
    for (const [key, value] of Object.entries(body)) {
      out.keys.add(key);
      keysAndValues(value, out);
    }
  } else if (typeof body === 'string' || typeof body === 'number') out.values.push(String(body));
  return out;
}

export const INTERNAL_KEYS = ['title', 'owner', 'ownerId', 'elements', 'notes', 'mop', 'freezeOverrideReason', 'workType', 'version'];

/** The internal keys found anywhere in `body`, and every value containing one of `secrets`. */
export function leaksIn(body: unknown, secrets: readonly string[]) {
  const { keys, values } = keysAndValues(body);
  return {
    keys: INTERNAL_KEYS.filter((k) => keys.has(k)),
    values: values.filter((v) => secrets.some((s) => v.includes(s))),
  };
}
