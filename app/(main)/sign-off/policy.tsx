// Sign-off policy (admin): approvals needed by risk class, and whether decisions need a one-time code.
import { ScrollView, StyleSheet, View } from 'react-native';
import { useMeQuery } from '@/hooks/queries/me';
import { useSignoffPoliciesMutation, useSignoffPoliciesQuery } from '@/hooks/queries/signoff';
import { EmptyState, ErrorState, LoadingState } from '@/components/screen-states';
import { SignoffPolicyForm } from '@/components/signoff/signoff-policy-form';
import { CONTENT_MAX_WIDTH_PX, space } from '@/constants/theme';

export default function SignoffPolicyScreen() {
  const isAdmin = useMeQuery().data?.roles.includes('admin') ?? false;
  const policies = useSignoffPoliciesQuery(isAdmin);
  const save = useSignoffPoliciesMutation();
  if (!isAdmin) return <EmptyState title="Only admins set the sign-off policy" />;
  if (policies.isError) return <ErrorState message={policies.error.message} onRetry={() => policies.refetch()} />;
  if (!policies.data) return <LoadingState label="Loading the policy…" />;
  return (
    <ScrollView contentContainerStyle={styles.page}>
      <View style={styles.column}>
        <SignoffPolicyForm
          policies={policies.data.policies} saving={save.isPending} saved={save.isSuccess}
          error={save.error?.message ?? null} onSave={(patch) => save.mutate(patch)}
        />
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  page: { padding: space.lg, alignItems: 'center' },
  column: { width: '100%', maxWidth: CONTENT_MAX_WIDTH_PX * 0.6 },
});
