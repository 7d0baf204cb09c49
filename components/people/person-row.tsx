// One person on the People list: name, e-mail, roles, tenant and state, with what an admin may do to them.
// Deactivating asks once more, since it ends the person's sessions at once.
import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { Person } from '@/shared/people';
import {
  useDeactivateMutation, useReactivateMutation, useResendInvitationMutation, useRevokeInvitationMutation, useSetRolesMutation,
} from '@/hooks/queries/people';
import { Button } from '@/components/button';
import { StatusPill } from '@/components/status-pill';
import { RolePicker, type RoleChoice } from '@/components/people/role-picker';
import { dayAndTime, rolesText, STATUS_LABELS, STATUS_TONES } from '@/components/people/people-words';
import { colors, radii, space, type } from '@/constants/theme';

type Props = { person: Person; tenants: readonly { id: string; name: string }[]; viewerZone: string; isSelf: boolean };
type Mode = 'view' | 'roles' | 'confirm-deactivate';

export function PersonRow({ person, tenants, viewerZone, isSelf }: Props) {
  const [mode, setMode] = useState<Mode>('view');
  const [choice, setChoice] = useState<RoleChoice>({ roles: person.roles, tenantId: person.tenantId });
  const setRoles = useSetRolesMutation();
  const deactivate = useDeactivateMutation();
  const reactivate = useReactivateMutation();
  const resend = useResendInvitationMutation();
  const revoke = useRevokeInvitationMutation();
  const failed = [setRoles, deactivate, reactivate, resend, revoke].find((m) => m.isError)?.error;
  const busy = [setRoles, deactivate, reactivate, resend, revoke].some((m) => m.isPending);
  const tid = `person-${person.id}`;

  let detail: string | null = null;
  if (person.status === 'invited') {
    detail = person.invitationExpiresAt ? `Invitation link works until ${dayAndTime(person.invitationExpiresAt, viewerZone)}` : 'Invitation link expired: send it again';
  } else if (person.status === 'deactivated' && person.deactivatedAt) {
    detail = `Deactivated ${dayAndTime(person.deactivatedAt, viewerZone)}`;
  }

  return (
    <View style={styles.row} testID={tid} role="listitem">
      <View style={styles.head}>
        <View style={styles.who}>
          <Text style={styles.name}>{person.name}{isSelf ? ' (you)' : ''}</Text>
          <Text style={styles.muted}>{person.email}</Text>
          <Text style={styles.muted} testID={`${tid}-roles`}>{rolesText(person.roles)}{person.tenantName ? ` · ${person.tenantName}` : ''}</Text>
          {detail ? <Text style={styles.muted}>{detail}</Text> : null}
        </View>
        <StatusPill label={STATUS_LABELS[person.status]} tone={STATUS_TONES[person.status]} testID={`${tid}-status`} />
      </View>
      {failed ? <Text style={styles.error} role="alert" testID={`${tid}-error`}>{failed.message}</Text> : null}
      {mode === 'roles' ? (
        <View style={styles.panel}>
          <RolePicker value={choice} onChange={setChoice} tenants={tenants} testID={`${tid}-role-picker`} />
          <View style={styles.actions}>
            <Button label="Cancel" variant="quiet" testID={`${tid}-roles-cancel`} onPress={() => { setMode('view'); setChoice({ roles: person.roles, tenantId: person.tenantId }); }} />
            <Button label="Save roles" testID={`${tid}-roles-save`} busy={setRoles.isPending}
              onPress={() => setRoles.mutate({ id: person.id, ...choice }, { onSuccess: () => setMode('view') })} />
          </View>
        </View>
      ) : null}
      {mode === 'confirm-deactivate' ? (
        <View style={styles.panel} testID={`${tid}-confirm`}>
          <Text style={styles.text}>
            Deactivate {person.name}? They are signed out everywhere at once and cannot sign in until reactivated. Their history stays.
          </Text>
          <View style={styles.actions}>
            <Button label="Keep active" variant="quiet" testID={`${tid}-confirm-cancel`} onPress={() => setMode('view')} />
            <Button label="Deactivate" testID={`${tid}-confirm-deactivate`} busy={deactivate.isPending}
              onPress={() => deactivate.mutate(person.id, { onSettled: () => setMode('view') })} />
          </View>
        </View>
      ) : null}
      {mode === 'view' ? (
        <View style={styles.actions}>
          {person.status !== 'deactivated' ? <Button label="Change roles" variant="quiet" testID={`${tid}-edit-roles`} disabled={busy} onPress={() => setMode('roles')} /> : null}
          {person.status === 'active' ? <Button label="Deactivate" variant="quiet" testID={`${tid}-deactivate`} disabled={busy} onPress={() => setMode('confirm-deactivate')} /> : null}
          {person.status === 'deactivated' ? <Button label="Reactivate" variant="quiet" testID={`${tid}-reactivate`} busy={reactivate.isPending} onPress={() => reactivate.mutate(person.id)} /> : null}
          {person.status === 'invited' ? (
            <>
              <Button label="Send the link again" variant="quiet" testID={`${tid}-resend`} busy={resend.isPending} onPress={() => resend.mutate(person.id)} />
              <Button label="Revoke invitation" variant="quiet" testID={`${tid}-revoke`} busy={revoke.isPending} onPress={() => revoke.mutate(person.id)} />
            </>
          ) : null}
        </View>
      ) : null}
      {resend.data && !resend.isPending ? <Text style={styles.muted} role="status" testID={`${tid}-resent`}>
        {resend.data.mailQueued ? `A new link went to ${resend.data.email}; the old one no longer works.` : 'The new link is saved, but its mail could not be sent. Try again.'}
      </Text> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { gap: space.sm, paddingVertical: space.md, borderBottomWidth: 1, borderBottomColor: colors.border },
  head: { flexDirection: 'row', justifyContent: 'space-between', gap: space.md },
  who: { flexShrink: 1, gap: space.xxs },
  name: { ...type.bodyStrong, color: colors.ink },
  muted: { ...type.caption, color: colors.inkMuted },
  text: { ...type.body, color: colors.ink },
  error: { ...type.bodyStrong, color: colors.danger, backgroundColor: colors.dangerSoft, padding: space.sm, borderRadius: radii.md },
  panel: { gap: space.md, padding: space.md, borderRadius: radii.md, backgroundColor: colors.tide },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
