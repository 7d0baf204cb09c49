// Sign-off policy (admin): approvals needed by risk class, and whether decisions need a one-time code.
import { useMeQuery } from '@/hooks/queries/me';
import { canAdminister } from '@/shared/permissions';
import { useSignoffPoliciesMutation, useSignoffPoliciesQuery } from '@/hooks/queries/signoff';
import { PageColumn } from '@/components/page-column';
import { EmptyState, ErrorState, LoadingState } from '@/components/screen-states';
import { SignoffPolicyForm } from '@/components/signoff/signoff-policy-form';
import { PageHeading, usePageTitle } from '@/components/page-title';

export default function SignoffPolicyScreen() {
  const isAdmin = canAdminister(useMeQuery().data?.roles ?? []);
  const policies = useSignoffPoliciesQuery(isAdmin);
  const save = useSignoffPoliciesMutation();
  usePageTitle('Sign-off policy');
  if (!isAdmin) return <EmptyState page title="Only admins set the sign-off policy" />;
  if (policies.isError) return <ErrorState message={policies.error.message} onRetry={() => void policies.refetch()} />;
  if (!policies.data) return <LoadingState label="Loading the policy…" />;
  return (
    <PageColumn narrow>
      <PageHeading>Sign-off policy</PageHeading>
      <SignoffPolicyForm
        policies={policies.data.policies} saving={save.isPending} saved={save.isSuccess}
        error={save.error?.message ?? null} onSave={(patch) => save.mutate(patch)}
      />
    </PageColumn>
  );
}
