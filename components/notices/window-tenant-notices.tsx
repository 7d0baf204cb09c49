// The window page's block on tenant notices (staff: admin, planner, approver): one row per tenant with its
// sending state; hidden until the window has notices.
import { StyleSheet, Text } from 'react-native';
import type { Me } from '@/shared/api';
import { canReadWindowNotices } from '@/shared/permissions';
import { useNoticeActionMutation, useWindowNoticesQuery } from '@/hooks/queries/notices';
import { Section } from '@/components/windows/section';
import { colors, type } from '@/constants/theme';
import { WindowNoticeRow } from './window-notice-row';

export function WindowTenantNotices({ windowId, me, timeZone }: { windowId: string; me: Me; timeZone: string }) {
  const staff = canReadWindowNotices(me.roles);
  const notices = useWindowNoticesQuery(windowId, staff);
  const action = useNoticeActionMutation();
  if (!staff || !notices.data || notices.data.notices.length === 0) return null;
  const blocked = notices.data.notices.filter((n) => n.status === 'blocked' && n.method === 'REQUEST').length;
  return (
    <Section title="Tenant notices" testID="window-notices">
      {blocked > 0 ? (
        <Text style={styles.warn}>{`${blocked} held back: they would reach the tenant later than its agreed lead time. An admin can send them with a reason.`}</Text>
      ) : null}
      {action.error ? <Text style={styles.warn} role="alert">{action.error.message}</Text> : null}
      {notices.data.notices.map((row) => (
        <WindowNoticeRow
          key={row.id} row={row} roles={me.roles} timeZone={timeZone} busy={action.isPending}
          onResend={() => action.mutate({ id: row.id, action: 'resend' })}
          onOverride={(reason) => action.mutate({ id: row.id, action: 'override', reason })}
        />
      ))}
    </Section>
  );
}

const styles = StyleSheet.create({
  warn: { ...type.body, color: colors.danger },
});
