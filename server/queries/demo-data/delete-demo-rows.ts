// Deletes for demo removal, each inside the caller's transaction, in foreign-key order (db/schema): sign-offs and
// windows (their elements, impacts, MOPs, plans and notices cascade), accounts, slices (functions, ties and
// placements cascade), tenants, spans, sites, then the map's name and outline. Audit rows have no foreign keys
// and stay.
import { and, eq, inArray, or } from 'drizzle-orm';
import type { Tx } from '../../../db/client';
import {
  networkMeta, notices, signoffs, sites, slices, spans, ssoIdentities, ssoSettings, tenants, users, windows,
} from '../../../db/schema';

export type DemoRowIds = {
  windowIds: string[];
  accountIds: string[];
  sliceIds: string[];
  tenantIds: string[];
  spanIds: string[];
  siteIds: string[];
  /** the caller, who stays: detached from a tenant that goes */
  keepUserId: string;
  networkName: string | null;
  /** the demo's test issuer, when single sign-on still points at it: its settings and account links go */
  demoIssuerUrl: string | null;
};

export async function deleteDemoRows(tx: Tx, ids: DemoRowIds): Promise<void> {
  // Decisions by accounts that go block their deletion (approver_id is ON DELETE RESTRICT).
  await tx.delete(signoffs).where(or(inArray(signoffs.windowId, ids.windowIds), inArray(signoffs.approverId, ids.accountIds)));
  await tx.delete(windows).where(inArray(windows.id, ids.windowIds));
  await tx.delete(notices).where(inArray(notices.tenantId, ids.tenantIds));
  await tx.delete(users).where(inArray(users.id, ids.accountIds));
  await tx.update(users).set({ tenantId: null }).where(and(eq(users.id, ids.keepUserId), inArray(users.tenantId, ids.tenantIds)));
  await tx.delete(slices).where(inArray(slices.id, ids.sliceIds));
  await tx.delete(tenants).where(inArray(tenants.id, ids.tenantIds));
  await tx.delete(spans).where(inArray(spans.id, ids.spanIds));
  await tx.delete(sites).where(inArray(sites.id, ids.siteIds));
  if (ids.demoIssuerUrl !== null) {
    await tx.delete(ssoIdentities).where(eq(ssoIdentities.issuer, ids.demoIssuerUrl));
    await tx.delete(ssoSettings).where(eq(ssoSettings.issuerUrl, ids.demoIssuerUrl));
  }
  if (ids.networkName !== null) {
    await tx.delete(networkMeta).where(and(eq(networkMeta.id, 'network'), eq(networkMeta.name, ids.networkName)));
  }
}
