// Single sign-on settings (admin): the company's OpenID Connect issuer and who gets which roles through it.
import { useMeQuery } from '@/hooks/queries/me';
import { useSsoSettingsMutation, useSsoSettingsQuery } from '@/hooks/queries/sso';
import { canAdminister } from '@/shared/permissions';
import { PageColumn } from '@/components/page-column';
import { EmptyState, ErrorState, LoadingState } from '@/components/screen-states';
import { SsoSettingsForm } from '@/components/sso/sso-settings-form';
import { PageHeading, usePageTitle } from '@/components/page-title';

export default function SsoSettingsScreen() {
  const me = useMeQuery();
  const isAdmin = canAdminister(me.data?.roles ?? []);
  const settings = useSsoSettingsQuery(isAdmin);
  const save = useSsoSettingsMutation();
  usePageTitle('Single sign-on');
  if (me.data && !isAdmin) return <EmptyState page title="Only admins set up single sign-on" />;
  if (settings.isError) return <ErrorState message={settings.error.message} onRetry={() => void settings.refetch()} />;
  if (!settings.data) return <LoadingState label="Loading single sign-on…" />;
  return (
    <PageColumn narrow>
      <PageHeading>Single sign-on</PageHeading>
      <SsoSettingsForm
        settings={settings.data} saving={save.isPending} saved={save.isSuccess}
        error={save.error?.message ?? null} onSave={(input) => save.mutate(input)}
      />
    </PageColumn>
  );
}
