// Security: set up (or remove) one-time codes for confirming sign-off decisions.
import { ScrollView, StyleSheet, View } from 'react-native';
import { useOtpConfirmMutation, useOtpEnrolMutation, useOtpRemoveMutation, useOtpStatusQuery } from '@/hooks/queries/signoff';
import { ErrorState, LoadingState } from '@/components/screen-states';
import { OtpEnrolmentView } from '@/components/signoff/otp-enrolment';
import { CONTENT_MAX_WIDTH_PX, space } from '@/constants/theme';

export default function SecurityScreen() {
  const status = useOtpStatusQuery();
  const enrol = useOtpEnrolMutation();
  const confirm = useOtpConfirmMutation();
  const remove = useOtpRemoveMutation();
  if (status.isError) return <ErrorState message={status.error.message} onRetry={() => status.refetch()} />;
  if (!status.data) return <LoadingState label="Loading your one-time codes…" />;
  const error = enrol.error ?? confirm.error ?? remove.error;
  return (
    <ScrollView contentContainerStyle={styles.page}>
      <View style={styles.column}>
        <OtpEnrolmentView
          status={status.data}
          enrolment={status.data.enrolled ? null : enrol.data ?? null}
          starting={enrol.isPending} confirming={confirm.isPending} removing={remove.isPending}
          error={error?.message ?? null}
          onStart={() => enrol.mutate()}
          onConfirm={(code) => confirm.mutate(code)}
          onRemove={(code) => remove.mutate(code, { onSuccess: () => enrol.reset() })}
        />
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  page: { padding: space.lg, alignItems: 'center' },
  column: { width: '100%', maxWidth: CONTENT_MAX_WIDTH_PX * 0.6 },
});
