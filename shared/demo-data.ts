// Removing the demo from a running instance: what would go, the explicit confirmation, and what went.
import { z } from 'zod';

const count = z.number().int().min(0);

/** Rows by kind, in the order the confirmation lists them. */
export const demoDataCountsSchema = z.object({
  sites: count,
  spans: count,
  tenants: count,
  slices: count,
  placements: count,
  windows: count,
  plans: count,
  notices: count,
  signoffs: count,
  accounts: count,
  networkOutline: count,
  /** 1 while single sign-on still points at the demo's local test issuer */
  demoSignOn: count,
});
export type DemoDataCounts = z.infer<typeof demoDataCountsSchema>;
export type DemoDataKind = keyof DemoDataCounts;

/** The demo account the asker is signed in with: it stays, so they are not locked out. */
export const keptAccountSchema = z.object({ name: z.string(), email: z.string() }).nullable();

/** GET /api/demo-data (admin). */
export const demoDataSummarySchema = z.object({
  present: z.boolean(),
  counts: demoDataCountsSchema,
  /** names of the demo accounts that go (never the asker's own) */
  accountNames: z.array(z.string()),
  keptAccount: keptAccountSchema,
});
export type DemoDataSummary = z.infer<typeof demoDataSummarySchema>;

/** The words the admin confirms with; the API refuses a removal without them. */
export const DEMO_REMOVAL_CONFIRMATION = 'remove demo data';

/** DELETE /api/demo-data body. */
export const demoRemovalRequestSchema = z.object({
  confirm: z.literal(DEMO_REMOVAL_CONFIRMATION, { error: `Type "${DEMO_REMOVAL_CONFIRMATION}" to confirm` }),
});

/** DELETE /api/demo-data answer: what went, in one transaction. */
export const demoRemovalResultSchema = z.object({ removed: demoDataCountsSchema, keptAccount: keptAccountSchema });
export type DemoRemovalResult = z.infer<typeof demoRemovalResultSchema>;
