// Signed-in area: sends visitors without a session to sign-in, then frames every screen in the app shell.
import { Redirect, Slot, usePathname, useRouter } from 'expo-router';
import { useMeQuery, useSignOutMutation } from '@/hooks/queries/me';
import { isApiError } from '@/hooks/api-fetch';
import { AppShell } from '@/components/shell/app-shell';
import { ErrorState, LoadingState } from '@/components/screen-states';
import { TenantWindowPage } from '@/components/notices/tenant-window-page';
import { tenantScopeOf } from '@/shared/permissions';

export default function MainLayout() {
  const me = useMeQuery();
  const signOut = useSignOutMutation();
  const pathname = usePathname();
  const router = useRouter();

  if (me.isError && isApiError(me.error) && me.error.status === 401) return <Redirect href="/sign-in" />;
  if (me.isError) return <ErrorState message={me.error.message} onRetry={() => void me.refetch()} />;
  if (!me.data) return <LoadingState />;
  return (
    <AppShell
      user={me.data}
      pathname={pathname}
      signingOut={signOut.isPending}
      onSignOut={() => signOut.mutate(undefined, { onSuccess: () => router.replace('/sign-in') })}
    >
      {/* The internal window pages are staff's; a tenant user reaching one by address gets its tenant view. */}
      {tenantScopeOf(me.data) !== null && pathname.startsWith('/windows') ? (
        <TenantWindowPage pathname={pathname} onOpenNotice={(id) => router.push({ pathname: '/notices/[id]', params: { id } })} />
      ) : <Slot />}
    </AppShell>
  );
}
