// The Imports screen's state: the kind chosen, the defaults and mapping, the file last picked (kept so it can be
// checked again), the import on show (just uploaded or picked from history), upload and apply with their errors.
import { useState } from 'react';
import type { ImportApplied, ImportCreated, ImportKind } from '@/shared/imports';
import {
  useImportApplyMutation, useImportQuery, useImportUploadMutation, type UploadFile,
} from '@/hooks/queries/imports';
import { hasMissingValueErrors } from './defaults-form';
import type { ImportRecordView } from './import-preview-view';
import { mappingToSend, picksFromRecognised, type MappingPicks } from './mapping-fields';
import { pickImportFile } from './pick-file';
import type { KindChoice } from './upload-panel';
import { useDefaultsForm } from './use-defaults-form';

const NO_PICKS: MappingPicks = { site: {}, span: {} };
const DEFAULTS_INVALID = 'Some values under "Fill what the file lacks" need fixing before the file is checked.';

export function useImportFlow() {
  const [kind, setKind] = useState<KindChoice>('auto');
  const [currentId, setCurrentId] = useState<string | null>(null);
  const [created, setCreated] = useState<ImportCreated | null>(null);
  const [kept, setKept] = useState<UploadFile | null>(null);
  const [picks, setPicks] = useState<MappingPicks>(NO_PICKS);
  const [applied, setApplied] = useState<Record<string, ImportApplied>>({});
  const [pickError, setPickError] = useState<string | null>(null);
  const defaults = useDefaultsForm();
  const upload = useImportUploadMutation();
  const apply = useImportApplyMutation();
  const detail = useImportQuery(created?.id === currentId ? null : currentId);

  const send = (file: UploadFile, fileKind: ImportKind | null, withMapping: boolean) => {
    setPickError(null);
    const filled = defaults.take();
    if (filled === null) {
      setPickError(DEFAULTS_INVALID);
      return;
    }
    apply.reset();
    const mapping = withMapping ? mappingToSend(picks) : null;
    upload.mutate({ upload: file, kind: fileKind, defaults: filled, mapping }, {
      onSuccess: (result) => {
        setKept(file);
        setCreated(result);
        setCurrentId(result.id);
        const sources = result.preview.sources;
        setPicks(sources ? picksFromRecognised(sources.recognised, sources.attributes) : NO_PICKS);
        if (hasMissingValueErrors(result.preview.errors.map((e) => e.message))) defaults.reveal();
      },
    });
  };

  const pickAndUpload = async () => {
    setPickError(null);
    // Check the defaults before the picker opens: a bad value should not cost the user a trip through it.
    if (defaults.take() === null) {
      setPickError(DEFAULTS_INVALID);
      return;
    }
    let file;
    try {
      file = await pickImportFile();
    } catch (error) {
      setPickError(error instanceof Error ? error.message : 'The file could not be read.');
      return;
    }
    if (!file) return;
    send(file, kind === 'auto' ? null : kind, false);
  };

  const record: ImportRecordView | null =
    created && created.id === currentId ? { ...created, status: applied[created.id] ? 'applied' : 'previewed' } : (detail.data ?? null);
  // The kept file is the one on show only while the preview on show is its latest.
  const keptRecord = kept && created && created.id === currentId ? created : null;

  return {
    kind, setKind, record, currentId, defaults, picks, setPicks,
    // Fire-and-forget from a button: pickAndUpload catches its own failure and shows it as pickError.
    pick: () => { void pickAndUpload(); },
    /** Check the kept file again with the current defaults (and, for GraphML, the mapping); null without one. */
    previewAgain: kept && keptRecord ? () => send(kept, keptRecord.kind, keptRecord.kind === 'graphml') : null,
    keptFileName: keptRecord ? keptRecord.fileName : null,
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
