// Security: set up (or remove) one-time codes for confirming sign-off decisions.
import { useOtpConfirmMutation, useOtpEnrolMutation, useOtpRemoveMutation, useOtpStatusQuery } from '@/hooks/queries/signoff';
import { PageColumn } from '@/components/page-column';
import { ErrorState, LoadingState } from '@/components/screen-states';
import { OtpEnrolmentView } from '@/components/signoff/otp-enrolment';

export default function SecurityScreen() {
  const status = useOtpStatusQuery();
  const enrol = useOtpEnrolMutation();
  const confirm = useOtpConfirmMutation();
  const remove = useOtpRemoveMutation();
  if (status.isError) return <ErrorState message={status.error.message} onRetry={() => void status.refetch()} />;
  if (!status.data) return <LoadingState label="Loading your one-time codes…" />;
  const error = enrol.error ?? confirm.error ?? remove.error;
  return (
    <PageColumn narrow>
      <OtpEnrolmentView
        status={status.data}
        enrolment={status.data.enrolled ? null : enrol.data ?? null}
        starting={enrol.isPending} confirming={confirm.isPending} removing={remove.isPending}
        error={error?.message ?? null}
        onStart={() => enrol.mutate()}
        onConfirm={(code) => confirm.mutate(code)}
        onRemove={(code) => remove.mutate(code, { onSuccess: () => enrol.reset() })}
      />
    </PageColumn>
  );
}
