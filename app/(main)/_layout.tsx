// Signed-in area: sends visitors without a session to sign-in, then frames every screen in the app shell.
import { Redirect, Slot, usePathname, useRouter } from 'expo-router';
import { useMeQuery, useSignOutMutation } from '@/hooks/queries/me';
import { isApiError } from '@/hooks/api-fetch';
import { AppShell } from '@/components/shell/app-shell';
import { ErrorState, LoadingState } from '@/components/screen-states';

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
      {/* Always mounted: a Slot swapped out and back in by address crashes on going back (see split-view.tsx);
          tenant users get their own view of window addresses inside those routes (staffWindowPage). */}
      <Slot />
    </AppShell>
  );
}
