// One tenant's notice on a window's page (staff): sending state, failures, acknowledgement, and the action
// that fits — resend after a failure (admin, planner) or send despite the lead time with a reason (admin).
import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { RoleName } from '@/shared/api';
import { canAdminister, canResendNotices } from '@/shared/permissions';
import type { NoticeStatusRow } from '@/shared/notices';
import { Button } from '@/components/button';
import { Badge } from '@/components/inventory/badges';
import { TextField } from '@/components/text-field';
import { formatInstant } from '@/components/time';
import { colors, radii, space, type } from '@/constants/theme';
import { sendingLabel } from './notice-format';

type Props = {
  row: NoticeStatusRow;
  roles: readonly RoleName[];
  timeZone: string;
  busy: boolean;
  onResend: () => void;
  onOverride: (reason: string) => void;
};

function facts(row: NoticeStatusRow, timeZone: string): string[] {
  const out = [`${row.recipients.length} ${row.recipients.length === 1 ? 'recipient' : 'recipients'}`, `version ${row.sequence}`];
  if (row.attempts > 0) out.push(`${row.attempts} ${row.attempts === 1 ? 'attempt' : 'attempts'}`);
  if (row.sentAt) out.push(`sent ${formatInstant(row.sentAt, timeZone)}`);
  out.push(row.acknowledgedAt ? `acknowledged ${formatInstant(row.acknowledgedAt, timeZone)}` : 'not acknowledged');
  return out;
}

export function WindowNoticeRow({ row, roles, timeZone, busy, onResend, onOverride }: Props) {
  const [reason, setReason] = useState('');
  const state = sendingLabel(row);
  const canResend = row.status === 'failed' && canResendNotices(roles);
  const canOverride = row.status === 'blocked' && row.method === 'REQUEST' && canAdminister(roles);
  return (
    <View style={styles.row} testID={`window-notice-${row.tenantId}`}>
      <View style={styles.top}>
        <Text style={styles.tenant}>{row.tenantName}</Text>
        <View style={styles.state}><Badge label={state.label} tone={state.tone} /></View>
      </View>
      <Text style={styles.meta}>{facts(row, timeZone).join(' · ')}</Text>
      {row.lastError ? <Text style={styles.error}>{`Last error: ${row.lastError}`}</Text> : null}
      {row.leadOverrideReason ? <Text style={styles.meta}>{`Lead time overridden: ${row.leadOverrideReason}`}</Text> : null}
      {canResend ? <Button label="Send again" variant="quiet" busy={busy} onPress={onResend} testID={`window-notice-resend-${row.tenantId}`} /> : null}
      {canOverride ? (
        <View style={styles.override}>
          <TextField label="Reason the tenant will read" value={reason} onChangeText={setReason} testID={`window-notice-reason-${row.tenantId}`} />
          <Button label="Send despite the lead time" busy={busy} disabled={reason.trim().length < 5}
            onPress={() => onOverride(reason.trim())} testID={`window-notice-override-${row.tenantId}`} />
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { gap: space.xs, padding: space.md, borderRadius: radii.md, backgroundColor: colors.tide },
  top: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', justifyContent: 'space-between', gap: space.sm },
  tenant: { ...type.bodyStrong, color: colors.ink, flexShrink: 1 },
  state: { flexShrink: 0 },
  meta: { ...type.caption, color: colors.inkMuted },
  error: { ...type.caption, color: colors.danger },
  override: { gap: space.sm },
});
