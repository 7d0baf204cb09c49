// The group → roles table of the single sign-on settings: one row per issuer group, the staff roles it gives.
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { Button } from '@/components/button';
import { TextField } from '@/components/text-field';
import { SSO_ROLE_NAMES, type SsoRoleName } from '@/shared/sso';
import { colors, radii, space, type } from '@/constants/theme';

export type GroupRow = { group: string; roles: SsoRoleName[] };

const ROLE_LABELS: Record<SsoRoleName, string> = { admin: 'Admin', engineer: 'Engineer', planner: 'Planner', approver: 'Approver' };

type Props = { rows: GroupRow[]; onChange: (rows: GroupRow[]) => void; problems: (string | undefined)[] };

export function SsoGroupRolesEditor({ rows, onChange, problems }: Props) {
  const update = (i: number, row: GroupRow) => onChange(rows.map((r, j) => (j === i ? row : r)));
  const toggle = (i: number, role: SsoRoleName) => {
    const roles = rows[i].roles.includes(role) ? rows[i].roles.filter((r) => r !== role) : [...rows[i].roles, role];
    update(i, { ...rows[i], roles: SSO_ROLE_NAMES.filter((r) => roles.includes(r)) });
  };
  return (
    <View style={styles.list} testID="sso-groups">
      {rows.length === 0 ? <Text style={styles.muted}>No groups yet: nobody can sign in through the issuer until a group gives a role.</Text> : null}
      {rows.map((row, i) => (
        <View key={i} style={styles.row} testID={`sso-group-${i}`}>
          <TextField label="Group on the issuer" value={row.group} testID={`sso-group-${i}-name`}
            onChangeText={(group) => update(i, { ...row, group })} autoCapitalize="none" autoCorrect={false} error={problems[i]} />
          <View style={styles.roles} role="group" aria-label={`Roles for ${row.group || 'this group'}`}>
            {SSO_ROLE_NAMES.map((role) => {
              const on = row.roles.includes(role);
              return (
                <Pressable key={role} role="checkbox" aria-checked={on} testID={`sso-group-${i}-role-${role}`}
                  onPress={() => toggle(i, role)} style={[styles.chip, on && styles.chipOn]}>
                  <Text style={[styles.chipText, on && styles.chipTextOn]}>{ROLE_LABELS[role]}</Text>
                </Pressable>
              );
            })}
          </View>
          <Button label="Remove this group" variant="quiet" testID={`sso-group-${i}-remove`} onPress={() => onChange(rows.filter((_, j) => j !== i))} />
        </View>
      ))}
      <Button label="Add a group" variant="quiet" testID="sso-group-add" onPress={() => onChange([...rows, { group: '', roles: [] }])} />
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.md },
  row: { gap: space.sm, borderWidth: 1, borderColor: colors.border, borderRadius: radii.md, padding: space.md },
  roles: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  chip: { borderWidth: 1, borderColor: colors.borderControl, borderRadius: radii.md, paddingVertical: space.xs, paddingHorizontal: space.md, minHeight: 44, justifyContent: 'center' },
  chipOn: { backgroundColor: colors.primary, borderColor: colors.primary },
  chipText: { ...type.body, color: colors.ink },
  chipTextOn: { color: colors.onPrimary },
  muted: { ...type.caption, color: colors.inkMuted },
});
