// Booking a new window: sends the form, then the MOP if one was chosen, and hands the new window's id on.
import { useRef } from 'react';
import type { Me } from '@/shared/api';
import { canBookInsideFreeze } from '@/shared/permissions';
import { newIdempotencyKey } from '@/hooks/idempotency-key';
import { useBookingPolicies, useWindowCreateMutation, useWindowMopUploadMutation } from '@/hooks/queries/windows';
import { WindowForm, type WindowSubmission } from '@/components/windows/window-form';
import { EMPTY_FORM, type WindowFormValues } from '@/components/windows/window-form-state';

export type SavedOutcome = { id: string; reverted: boolean; conflictCount: number; mopError: string | null };

type Props = {
  me: Me; timeZone: string; onSaved: (outcome: SavedOutcome) => void; onCancel: () => void;
  /** the form's starting values, e.g. a slot picked in the slot finder; empty when unset */
  initialValues?: WindowFormValues;
};

export function BookWindow({ me, timeZone, onSaved, onCancel, initialValues = EMPTY_FORM }: Props) {
  const policy = useBookingPolicies();
  const create = useWindowCreateMutation();
  const upload = useWindowMopUploadMutation();
  // One key per opened form, kept across retries of its submit (a refused booking leaves it unused on the
  // server), so a double click or a retry after a lost answer books one window; a new one after a success.
  const idempotencyKey = useRef(newIdempotencyKey());

  const save = async ({ output, freezeOverrideReason, mop }: WindowSubmission) => {
    let saved;
    try {
      saved = await create.mutateAsync({ input: { ...output, freezeOverrideReason }, idempotencyKey: idempotencyKey.current });
      idempotencyKey.current = newIdempotencyKey();
    } catch {
      return; // The form shows create.error beside its fields; every input stays.
    }
    let mopError: string | null = null;
    if (mop) {
      // The window is booked either way; a failed upload is reported on its page, where Edit can retry it.
      mopError = await upload.mutateAsync({ id: saved.window.id, file: mop }).then(() => null, (e: Error) => e.message);
    }
    onSaved({ id: saved.window.id, reverted: false, conflictCount: saved.conflictCount, mopError });
  };

  return (
    <WindowForm
      initialValues={initialValues}
      timeZone={timeZone}
      policy={policy}
      submitLabel="Book window"
      submitting={create.isPending || upload.isPending}
      saveError={create.error}
      canOverrideFreeze={canBookInsideFreeze(me.roles)}
      onSubmit={(submission) => void save(submission)}
      onCancel={onCancel}
    />
  );
}
