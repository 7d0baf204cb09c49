// Imports: upload a file for a preview, apply a previewed import, the list of past imports and one import.
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import {
  importAppliedSchema, importCreatedSchema, importDetailSchema, importListSchema,
  type ImportDefaultsInput, type ImportKind, type ImportMapping,
} from '@/shared/imports';
import { apiFetch } from '@/hooks/api-fetch';
import { networkMapKey } from '@/hooks/queries/network-map';
import { overviewKey } from '@/hooks/queries/overview';
import { sitesKey } from '@/hooks/queries/sites';
import { slicesKey } from '@/hooks/queries/slices';
import { spansKey } from '@/hooks/queries/spans';
import { tenantsKey } from '@/hooks/queries/tenants';

const IMPORTS_ROOT = ['imports'] as const;

export const importsKey = () => IMPORTS_ROOT;
export const importListKey = () => [...IMPORTS_ROOT, 'list'] as const;
export const importKey = (id: string) => [...IMPORTS_ROOT, 'detail', id] as const;

/** Where the CSV template of a kind downloads from. */
export function importTemplateUrl(kind: 'csv-sites' | 'csv-spans' | 'csv-slices'): string {
  return `${process.env.EXPO_PUBLIC_API_URL ?? ''}/api/imports/templates/${kind}`;
}

/**
 * A picked file: on the web the browser's File; on a device the picker's file URI, which React Native's
 * FormData sends when given `{ uri, name, type }`.
 */
export type UploadFile = { name: string; file?: Blob; uri?: string; mimeType?: string };

/** One upload: the file, its kind (null: the server decides) and, optionally, defaults and a mapping. */
export type UploadRequest = { upload: UploadFile; kind: ImportKind | null; defaults?: ImportDefaultsInput | null; mapping?: ImportMapping | null };

export function uploadBody({ upload, kind, defaults, mapping }: UploadRequest): FormData {
  const form = new FormData();
  if (upload.file) {
    form.append('file', upload.file, upload.name);
  } else {
    const native = { uri: upload.uri ?? '', name: upload.name, type: upload.mimeType ?? 'application/octet-stream' };
    form.append('file', native as unknown as Blob);
  }
  // No kind: the server decides from the extension and the content.
  if (kind) form.append('kind', kind);
  // Absent fields keep the file as it is: missing values stay errors and our usual attribute names apply.
  if (defaults) form.append('defaults', JSON.stringify(defaults));
  if (mapping) form.append('mapping', JSON.stringify(mapping));
  return form;
}

export function useImportsQuery() {
  return useQuery({ queryKey: importListKey(), queryFn: () => apiFetch('/api/imports', importListSchema) });
}

export function useImportQuery(id: string | null) {
  return useQuery({
    queryKey: importKey(id ?? ''),
    queryFn: () => apiFetch(`/api/imports/${encodeURIComponent(id ?? '')}`, importDetailSchema),
    enabled: id !== null,
  });
}

export function useImportUploadMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (request: UploadRequest) =>
      apiFetch('/api/imports', importCreatedSchema, { method: 'POST', body: uploadBody(request) }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: importListKey() }),
  });
}

export function useImportApplyMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => apiFetch(`/api/imports/${encodeURIComponent(id)}/apply`, importAppliedSchema, { method: 'POST' }),
    onSuccess: async (_applied, id) => {
      // An applied import changes the network, tenants and slices: every inventory view must read again.
      const keys = [importsKey(), importKey(id), sitesKey(), spansKey(), slicesKey(), tenantsKey(), networkMapKey(), overviewKey()];
      await Promise.all(keys.map((queryKey) => queryClient.invalidateQueries({ queryKey })));
    },
  });
}
