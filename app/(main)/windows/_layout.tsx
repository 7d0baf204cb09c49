// Window pages: staff get the internal pages; a tenant user reaching one by address gets its tenant view instead.
// The choice depends on the user only, never on the address, so the Slot below is never mounted and unmounted
// while someone moves between windows (a navigator that comes and goes under one route loops on re-mount).
import { Slot, usePathname, useRouter } from 'expo-router';
import { useMeQuery } from '@/hooks/queries/me';
import { TenantWindowPage } from '@/components/notices/tenant-window-page';
import { tenantScopeOf } from '@/shared/permissions';

export default function WindowsLayout() {
  const me = useMeQuery();
  const pathname = usePathname();
  const router = useRouter();
  // The signed-in layout above renders this only once the user is known.
  if (me.data && tenantScopeOf(me.data) !== null) {
    return <TenantWindowPage pathname={pathname} onOpenNotice={(id) => router.push({ pathname: '/notices/[id]', params: { id } })} />;
  }
  return <Slot />;
}
