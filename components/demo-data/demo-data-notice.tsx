// Overview and Imports, admins only: the instance still holds the invented demo, whose accounts share a published
// password; one tap to the page that removes it. Shows nothing once the demo is gone or for other roles.
import { canAdminister } from '@/shared/permissions';
import { useMeQuery } from '@/hooks/queries/me';
import { DEMO_NOTICE_STALE_MS, useDemoDataQuery } from '@/hooks/queries/demo-data';
import { colors } from '@/constants/theme';
import { ActionPanel } from '@/components/overview/action-panel';

export function DemoDataNotice() {
  const admin = canAdminister(useMeQuery().data?.roles ?? []);
  const present = useDemoDataQuery({ enabled: admin, staleTime: DEMO_NOTICE_STALE_MS }).data?.present ?? false;
  if (!admin || !present) return null;
  return (
    <ActionPanel testID="demo-data-notice" lead="The invented demo is still here"
      body="Its network, windows and accounts (with a published password) are for trying the tool. Remove them before it holds real data."
      href="/demo-data" action="Review and remove the demo" accent={colors.warning} />
  );
}
