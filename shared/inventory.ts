// Inventory API contract (what the sites, spans, tenants, slices, network and export routes answer): re-exports and types.
import type { z } from 'zod';
import type {
  siteListQuerySchema, spanListQuerySchema, sliceListQuerySchema, tenantListQuerySchema, siteRowSchema, spanRowSchema,
  sliceRowSchema, tenantRowSchema, siteListSchema, spanListSchema, sliceListSchema, tenantListSchema,
} from './inventory-lists';
import type {
  siteDetailSchema, spanDetailSchema, sliceDetailSchema, tenantDetailSchema, sliceFunctionViewSchema,
  sliceTieViewSchema, placementRevisionSchema, networkMapSchema, sliceUseSchema,
} from './inventory-details';

export * from './inventory-lists';
export * from './inventory-details';

export type SliceUse = z.infer<typeof sliceUseSchema>;
export type SiteListQuery = z.infer<typeof siteListQuerySchema>;
export type SpanListQuery = z.infer<typeof spanListQuerySchema>;
export type SliceListQuery = z.infer<typeof sliceListQuerySchema>;
export type TenantListQuery = z.infer<typeof tenantListQuerySchema>;
export type SiteRow = z.infer<typeof siteRowSchema>;
export type SpanRow = z.infer<typeof spanRowSchema>;
export type SliceRow = z.infer<typeof sliceRowSchema>;
export type TenantRow = z.infer<typeof tenantRowSchema>;
export type SiteList = z.infer<typeof siteListSchema>;
export type SpanList = z.infer<typeof spanListSchema>;
export type SliceList = z.infer<typeof sliceListSchema>;
export type TenantList = z.infer<typeof tenantListSchema>;
export type SiteDetail = z.infer<typeof siteDetailSchema>;
export type SpanDetail = z.infer<typeof spanDetailSchema>;
export type SliceDetail = z.infer<typeof sliceDetailSchema>;
export type TenantDetail = z.infer<typeof tenantDetailSchema>;
export type SliceFunctionView = z.infer<typeof sliceFunctionViewSchema>;
export type SliceTieView = z.infer<typeof sliceTieViewSchema>;
export type PlacementRevision = z.infer<typeof placementRevisionSchema>;
export type NetworkMap = z.infer<typeof networkMapSchema>;
