// Which freeze is being edited (none, a new one, or an id) and the create / update / delete calls behind the form.
import { useState } from 'react';
import type { FreezeCreate } from '@/shared/freezes';
import { useFreezeCreateMutation, useFreezeDeleteMutation, useFreezeUpdateMutation } from '@/hooks/queries/freezes';

export type FreezeEditing = null | { mode: 'new' } | { mode: 'edit'; id: string };

export type FreezeEditor = {
  editing: FreezeEditing;
  startNew: () => void;
  startEdit: (id: string) => void;
  cancel: () => void;
  save: (value: FreezeCreate) => void;
  remove: (id: string) => void;
  saving: boolean;
  saveError?: string;
  deletingId?: string;
  deleteError?: string;
};

export function useFreezeEditor(): FreezeEditor {
  const [editing, setEditing] = useState<FreezeEditing>(null);
  const create = useFreezeCreateMutation();
  const update = useFreezeUpdateMutation();
  const destroy = useFreezeDeleteMutation();
  const active = editing?.mode === 'edit' ? update : create;
  const open = (next: FreezeEditing) => {
    create.reset();
    update.reset();
    setEditing(next);
  };
  return {
    editing,
    startNew: () => open({ mode: 'new' }),
    startEdit: (id) => open({ mode: 'edit', id }),
    cancel: () => open(null),
    save: (value) => {
      const done = { onSuccess: () => setEditing(null) };
      if (editing?.mode === 'edit') update.mutate({ id: editing.id, patch: value }, done);
      else create.mutate(value, done);
    },
    remove: (id) => destroy.mutate(id),
    saving: active.isPending,
    saveError: active.error?.message,
    deletingId: destroy.isPending ? destroy.variables : undefined,
    deleteError: destroy.error?.message,
  };
}
