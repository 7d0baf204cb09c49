// One-time codes for confirming sign-off decisions, wired to the API (operators only: tenants never confirm decisions).
import { useOtpConfirmMutation, useOtpEnrolMutation, useOtpRemoveMutation, useOtpStatusQuery } from '@/hooks/queries/signoff';
import { ErrorState, LoadingState } from '@/components/screen-states';
import { OtpEnrolmentView } from '@/components/signoff/otp-enrolment';
import { useViewerTimeZone } from '@/components/time/use-viewer-time-zone';

export function OtpSection() {
  const timeZone = useViewerTimeZone();
  const status = useOtpStatusQuery();
  const enrol = useOtpEnrolMutation();
  const confirm = useOtpConfirmMutation();
  const remove = useOtpRemoveMutation();
  if (status.isError) return <ErrorState message={status.error.message} onRetry={() => void status.refetch()} />;
  if (!status.data) return <LoadingState label="Loading your one-time codes…" />;
  const error = enrol.error ?? confirm.error ?? remove.error;
  return (
    <OtpEnrolmentView
      status={status.data}
      timeZone={timeZone}
      enrolment={status.data.enrolled ? null : enrol.data ?? null}
      starting={enrol.isPending} confirming={confirm.isPending} removing={remove.isPending}
      error={error?.message ?? null}
      onStart={() => enrol.mutate()}
      onConfirm={(code) => confirm.mutate(code)}
      onRemove={(code) => remove.mutate(code, { onSuccess: () => enrol.reset() })}
    />
  );
}
