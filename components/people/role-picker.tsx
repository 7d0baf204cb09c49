// Roles (one or more) and, for a tenant contact, the one tenant they belong to. Choosing the tenant role clears the
// operator roles and the other way round, so the picker never offers a mix the API refuses.
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { ROLE_NAMES, type RoleName } from '@/shared/api';
import { ChoiceChips } from '@/components/windows/choice-chips';
import { ROLE_LABELS } from '@/components/people/people-words';
import { colors, radii, space, type } from '@/constants/theme';

export type RoleChoice = { roles: RoleName[]; tenantId: string | null };
type Props = {
  value: RoleChoice;
  onChange: (next: RoleChoice) => void;
  tenants: readonly { id: string; name: string }[];
  testID: string;
  error?: string;
};

/** The choice after toggling `role`: the tenant role stands alone. */
export function toggleRole(value: RoleChoice, role: RoleName): RoleChoice {
  if (value.roles.includes(role)) {
    const roles = value.roles.filter((r) => r !== role);
    return { roles, tenantId: role === 'tenant' ? null : value.tenantId };
  }
  if (role === 'tenant') return { roles: ['tenant'], tenantId: value.tenantId };
  return { roles: [...value.roles.filter((r) => r !== 'tenant'), role], tenantId: null };
}

export function RolePicker({ value, onChange, tenants, testID, error }: Props) {
  return (
    <View style={styles.block}>
      <Text style={styles.label} nativeID={`${testID}-label`}>Roles</Text>
      <View style={styles.row} role="group" aria-labelledby={`${testID}-label`}>
        {ROLE_NAMES.map((role) => {
          const on = value.roles.includes(role);
          return (
            <Pressable
              key={role}
              role="checkbox"
              aria-checked={on}
              testID={`${testID}-${role}`}
              onPress={() => onChange(toggleRole(value, role))}
              style={[styles.chip, on && styles.chipOn]}
            >
              <Text style={[styles.chipText, on && styles.chipTextOn]}>{on ? '✓ ' : ''}{ROLE_LABELS[role]}</Text>
            </Pressable>
          );
        })}
      </View>
      {value.roles.includes('tenant') ? (
        <View style={styles.block}>
          <Text style={styles.label}>Tenant</Text>
          <ChoiceChips
            label="Tenant"
            testID={`${testID}-tenant`}
            choices={tenants.map((t) => ({ value: t.id, label: t.name }))}
            value={value.tenantId ?? ''}
            onChange={(tenantId) => onChange({ ...value, tenantId: tenantId === '' ? null : tenantId })}
          />
        </View>
      ) : null}
      {error ? <Text style={styles.error} testID={`${testID}-error`}>{error}</Text> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  block: { gap: space.sm },
  label: { ...type.label, color: colors.ink },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  chip: {
    borderWidth: 1.5, borderColor: colors.border, borderRadius: radii.pill, paddingHorizontal: space.md,
    paddingVertical: space.xs + 2, minHeight: 36, justifyContent: 'center', backgroundColor: colors.surface,
  },
  chipOn: { borderColor: colors.primary, backgroundColor: colors.primarySoft },
  chipText: { ...type.label, color: colors.ink },
  chipTextOn: { color: colors.primary },
  error: { ...type.caption, color: colors.danger },
});
