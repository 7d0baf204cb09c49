// Single sign-on settings (admin): the company's OpenID Connect issuer and who gets which roles through it.
import { Link } from 'expo-router';
import { StyleSheet } from 'react-native';
import { useMeQuery } from '@/hooks/queries/me';
import { useSsoSettingsMutation, useSsoSettingsQuery } from '@/hooks/queries/sso';
import { canAdminister } from '@/shared/permissions';
import { PageColumn } from '@/components/page-column';
import { EmptyState, ErrorState, LoadingState } from '@/components/screen-states';
import { SsoSettingsForm } from '@/components/sso/sso-settings-form';
import { PageHeading, usePageTitle } from '@/components/page-title';
import { colors, space, type } from '@/constants/theme';

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
      <Link href="/people" style={styles.back} testID="sso-back-to-people">‹ People</Link>
      <PageHeading>Single sign-on</PageHeading>
      <SsoSettingsForm
        settings={settings.data} saving={save.isPending} saved={save.isSuccess}
        error={save.error?.message ?? null} onSave={(input) => save.mutate(input)}
      />
    </PageColumn>
  );
}

const styles = StyleSheet.create({ back: { ...type.bodyStrong, color: colors.primary, alignSelf: 'flex-start', paddingVertical: space.xs } });
