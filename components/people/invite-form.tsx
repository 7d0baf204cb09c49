// Invite someone: e-mail, name, roles (and tenant for a tenant contact). Checked with the shared schema first;
// after sending, says where the link went and until when it works.
import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { INVITATION_VALID_HOURS, invitationRequestSchema, type Invitation } from '@/shared/people';
import { useInviteMutation } from '@/hooks/queries/people';
import { Button } from '@/components/button';
import { TextField } from '@/components/text-field';
import { RolePicker, type RoleChoice } from '@/components/people/role-picker';
import { colors, radii, space, type } from '@/constants/theme';

type Errors = Partial<Record<'email' | 'name' | 'roles', string>>;
type Props = { tenants: readonly { id: string; name: string }[]; onClose: () => void };

export function sentText(invitation: Invitation): string {
  if (!invitation.mailQueued) return `The invitation for ${invitation.name} is saved, but its mail could not be sent. Use "Send the link again" on the list.`;
  return `Invitation sent to ${invitation.email}. The link works once, for ${INVITATION_VALID_HOURS} hours.`;
}

export function InviteForm({ tenants, onClose }: Props) {
  const [email, setEmail] = useState('');
  const [name, setName] = useState('');
  const [choice, setChoice] = useState<RoleChoice>({ roles: [], tenantId: null });
  const [errors, setErrors] = useState<Errors>({});
  const invite = useInviteMutation();

  const submit = () => {
    if (invite.isPending) return;
    const parsed = invitationRequestSchema.safeParse({ email: email.trim(), name, roles: choice.roles, tenantId: choice.tenantId });
    const found: Errors = {};
    if (!parsed.success) {
      for (const issue of parsed.error.issues) {
        const field = (issue.path[0] === 'tenantId' ? 'roles' : issue.path[0]) as keyof Errors;
        found[field] ??= issue.message;
      }
    }
    setErrors(found);
    if (parsed.success) invite.mutate(parsed.data);
  };

  if (invite.data) {
    return (
      <View style={styles.panel} testID="people-invite-done">
        <Text style={styles.text} role="status">{sentText(invite.data)}</Text>
        <View style={styles.actions}>
          <Button label="Invite someone else" variant="quiet" testID="people-invite-another" onPress={() => { invite.reset(); setEmail(''); setName(''); setChoice({ roles: [], tenantId: null }); }} />
          <Button label="Done" testID="people-invite-close" onPress={onClose} />
        </View>
      </View>
    );
  }
  return (
    <View style={styles.panel} role="form" aria-label="Invite someone" testID="people-invite-form">
      <Text style={styles.heading}>Invite someone</Text>
      {invite.isError ? <Text style={styles.error} role="alert" testID="people-invite-error">{invite.error.message}</Text> : null}
      <TextField label="E-mail" testID="people-invite-email" value={email} onChangeText={setEmail} error={errors.email}
        autoCapitalize="none" autoComplete="off" autoCorrect={false} inputMode="email" />
      <TextField label="Name" testID="people-invite-name" value={name} onChangeText={setName} error={errors.name} />
      <RolePicker value={choice} onChange={setChoice} tenants={tenants} testID="people-invite-roles" error={errors.roles} />
      <View style={styles.actions}>
        <Button label="Cancel" variant="quiet" testID="people-invite-cancel" onPress={onClose} />
        <Button label={invite.isPending ? 'Sending…' : 'Send invitation'} testID="people-invite-submit" onPress={submit} busy={invite.isPending} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  panel: { gap: space.lg, padding: space.lg, borderRadius: radii.lg, borderWidth: 1, borderColor: colors.border, backgroundColor: colors.surface },
  heading: { ...type.heading, color: colors.ink },
  text: { ...type.body, color: colors.ink },
  error: { ...type.bodyStrong, color: colors.danger, backgroundColor: colors.dangerSoft, padding: space.md, borderRadius: radii.md },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, justifyContent: 'flex-end' },
});
