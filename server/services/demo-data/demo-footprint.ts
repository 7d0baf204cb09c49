// What removing the demo would take: the demo's own rows still present, and every row that cannot outlive them.
import type { DemoIdentity } from '../../../db/seed/demo-identity';
import type { Queryable } from '../../../db/client';
import type { DemoDataCounts } from '../../../shared/demo-data';
import {
  countNoticesOf, countPlacementsOf, countPlansOf, countSignoffsOf, networkMetaNamed, selectAccountsFor, ssoSettingsAre,
  selectCurrentPlacements, selectPresentSiteIds, selectPresentTenantIds, selectSliceIdsFor, selectSpanIdsFor,
  selectWindowIdsFor, type AccountRow, type CurrentPlacement,
} from '../../queries/demo-data/demo-rows';
import type { DemoRowIds } from '../../queries/demo-data/delete-demo-rows';
import { DEMO_ISSUER_URL, DEMO_SSO_CLIENT_ID } from '../../../db/seed/seed-sso';

export type DemoFootprint = {
  ids: DemoRowIds;
  counts: DemoDataCounts;
  accounts: AccountRow[];
  /** the caller's own demo account, which stays */
  keptAccount: { name: string; email: string } | null;
};

/** Slices placed (now) on a site or span that goes: their placement would point at nothing. */
function slicesLivingOn(placements: CurrentPlacement[], siteIds: Set<string>, spanIds: Set<string>): string[] {
  return placements.filter((p) =>
    Object.values(p.sites).some((site) => siteIds.has(site))
    || Object.values(p.paths).some((path) => path.some((span) => spanIds.has(span))),
  ).map((p) => p.sliceId);
}

export async function findDemoFootprint(db: Queryable, demo: DemoIdentity, callerId: string): Promise<DemoFootprint> {
  const siteIds = await selectPresentSiteIds(db, demo.siteIds);
  const spanIds = await selectSpanIdsFor(db, { spanIds: demo.spanIds, siteIds });
  const tenantIds = await selectPresentTenantIds(db, demo.tenantIds);
  const stranded = slicesLivingOn(await selectCurrentPlacements(db), new Set(siteIds), new Set(spanIds));
  const sliceIds = await selectSliceIdsFor(db, { sliceIds: [...demo.sliceIds, ...stranded], tenantIds });
  const windowIds = await selectWindowIdsFor(db, { windowIds: demo.windowIds, siteIds, spanIds });
  const matched = await selectAccountsFor(db, { ids: demo.accountIds, emails: demo.accountEmails, tenantIds });
  const accounts = matched.filter((a) => a.id !== callerId);
  const caller = matched.find((a) => a.id === callerId);
  const accountIds = accounts.map((a) => a.id);
  const metaIsDemo = await networkMetaNamed(db, demo.networkName);
  const signOnIsDemo = await ssoSettingsAre(db, { issuerUrl: DEMO_ISSUER_URL, clientId: DEMO_SSO_CLIENT_ID });
  const counts: DemoDataCounts = {
    sites: siteIds.length,
    spans: spanIds.length,
    tenants: tenantIds.length,
    slices: sliceIds.length,
    placements: await countPlacementsOf(db, sliceIds),
    windows: windowIds.length,
    plans: await countPlansOf(db, windowIds),
    notices: await countNoticesOf(db, { windowIds, tenantIds }),
    signoffs: await countSignoffsOf(db, { windowIds, approverIds: accountIds }),
    accounts: accounts.length,
    networkOutline: metaIsDemo ? 1 : 0,
    demoSignOn: signOnIsDemo ? 1 : 0,
  };
  return {
    ids: { windowIds, accountIds, sliceIds, tenantIds, spanIds, siteIds, keepUserId: callerId, networkName: metaIsDemo ? demo.networkName : null,
      demoIssuerUrl: signOnIsDemo ? DEMO_ISSUER_URL : null },
    counts,
    accounts,
    keptAccount: caller ? { name: caller.name, email: caller.email } : null,
  };
}

/** Demo data is present while any row it would remove is. */
export function isPresent(counts: DemoDataCounts): boolean {
  return Object.values(counts).some((n) => n > 0);
}
