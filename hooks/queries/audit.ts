// The audit trail (admin, approver): one page of entries for the chosen filters, the filters' choices, and the
// address of the filtered CSV.
import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { auditChoicesSchema, auditPageSchema } from '@/shared/audit';
import { apiFetch } from '@/hooks/api-fetch';
import { listQueryString } from '@/hooks/queries/list-params';

const AUDIT_ROOT = ['audit'] as const;
export const AUDIT_PAGE_SIZE = 50;

/** What the API's filters take: ids for window and person, an action code, instants for the range. */
export type AuditParams = { window?: string; person?: string; action?: string; from?: string; to?: string };

export const auditKey = () => [...AUDIT_ROOT] as const;
export const auditPageKey = (params: AuditParams, page: number) => [...AUDIT_ROOT, 'page', params, page] as const;
export const auditChoicesKey = () => [...AUDIT_ROOT, 'choices'] as const;

/** Every filtered entry as CSV; the browser downloads it (Content-Disposition: attachment). */
export function auditCsvUrl(params: AuditParams): string {
  return `/api/audit${listQueryString({ ...params, format: 'csv' })}`;
}

export function useAuditPageQuery(params: AuditParams, page: number, enabled = true) {
  return useQuery({
    queryKey: auditPageKey(params, page),
    queryFn: () => apiFetch(`/api/audit${listQueryString({ ...params, page, pageSize: AUDIT_PAGE_SIZE })}`, auditPageSchema),
    enabled,
    // Keep the last page on screen while the next one loads, so the list does not flash empty between pages.
    placeholderData: keepPreviousData,
  });
}

export function useAuditChoicesQuery(enabled = true) {
  return useQuery({ queryKey: auditChoicesKey(), queryFn: () => apiFetch('/api/audit/choices', auditChoicesSchema), enabled });
}
