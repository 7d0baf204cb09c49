// The Imports screen's state: the kind chosen, the import on show (just uploaded or picked from history),
// upload and apply with their errors.
import { useState } from 'react';
import type { ImportApplied, ImportCreated } from '@/shared/imports';
import { useImportApplyMutation, useImportQuery, useImportUploadMutation } from '@/hooks/queries/imports';
import type { ImportRecordView } from './import-preview-view';
import { pickImportFile } from './pick-file';
import type { KindChoice } from './upload-panel';

export function useImportFlow() {
  const [kind, setKind] = useState<KindChoice>('auto');
  const [currentId, setCurrentId] = useState<string | null>(null);
  const [created, setCreated] = useState<ImportCreated | null>(null);
  const [applied, setApplied] = useState<Record<string, ImportApplied>>({});
  const [pickError, setPickError] = useState<string | null>(null);
  const upload = useImportUploadMutation();
  const apply = useImportApplyMutation();
  const detail = useImportQuery(created?.id === currentId ? null : currentId);

  const pickAndUpload = async () => {
    setPickError(null);
    let file;
    try {
      file = await pickImportFile();
    } catch (error) {
      setPickError(error instanceof Error ? error.message : 'The file could not be read.');
      return;
    }
    if (!file) return;
    apply.reset();
    upload.mutate({ upload: file, kind: kind === 'auto' ? null : kind }, {
      onSuccess: (result) => {
        setCreated(result);
        setCurrentId(result.id);
      },
    });
  };

  const record: ImportRecordView | null =
    created && created.id === currentId ? { ...created, status: applied[created.id] ? 'applied' : 'previewed' } : (detail.data ?? null);

  return {
    kind, setKind, record, currentId,
    // Fire-and-forget from a button: pickAndUpload catches its own failure and shows it as pickError.
    pick: () => { void pickAndUpload(); },
    open: (id: string) => { apply.reset(); setCurrentId(id); },
    uploading: upload.isPending,
    uploadError: pickError ?? upload.error?.message ?? null,
    detailLoading: currentId !== null && record === null && !detail.isError,
    detailError: detail.error?.message ?? null,
    applying: apply.isPending,
    applyError: apply.error?.message ?? null,
    applied: currentId ? (applied[currentId] ?? null) : null,
    applyCurrent: () => {
      if (!currentId) return;
      apply.mutate(currentId, { onSuccess: (result) => setApplied((all) => ({ ...all, [result.id]: result })) });
    },
  };
}
