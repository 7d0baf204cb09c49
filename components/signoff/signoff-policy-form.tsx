// Admin: how many approvals a window needs by risk class, and whether decisions need a one-time code.
import { useState } from 'react';
import { StyleSheet, Switch, Text, View } from 'react-native';
import type { Policies, PoliciesPatch } from '@/shared/policies';
import { Button } from '@/components/button';
import { TextField } from '@/components/text-field';
import { Section } from '@/components/windows/section';
import { colors, space, type } from '@/constants/theme';

type Props = { policies: Policies; saving: boolean; error: string | null; saved: boolean; onSave: (patch: PoliciesPatch) => void };

const QUORUM_RANGE = { min: 1, max: 9 };
const quorumOf = (text: string) => {
  const n = Number(text);
  return Number.isInteger(n) && n >= QUORUM_RANGE.min && n <= QUORUM_RANGE.max ? n : null;
};

/** The server refuses the same (PATCH /api/policies, QUORUM_ORDER); said here before the round trip. */
export function quorumOrderProblem(low: number | null, high: number | null): string | undefined {
  if (low === null || high === null || high >= low) return undefined;
  return `High risk needs at least as many approvals as low risk: ${high} (high risk) is fewer than ${low} (low risk).`;
}

export function SignoffPolicyForm({ policies, saving, error, saved, onSave }: Props) {
  const [low, setLow] = useState(String(policies.signoffQuorumLow));
  const [high, setHigh] = useState(String(policies.signoffQuorumHigh));
  const [requireCode, setRequireCode] = useState(policies.signoffRequireCode);
  const bad = 'A whole number from 1 to 9.';
  const order = quorumOrderProblem(quorumOf(low), quorumOf(high));
  const valid = quorumOf(low) !== null && quorumOf(high) !== null && !order;
  return (
    <Section title="Approvals and codes" testID="signoff-policy">
      <Text style={styles.muted}>High risk: the plan moves a critical slice, rates a slice's risk high or critical, or leaves a slice unresolved. Everything else is low risk.</Text>
      <TextField label="Approvals needed, low risk" value={low} onChangeText={setLow} keyboardType="number-pad" testID="policy-quorum-low" error={quorumOf(low) === null ? bad : undefined} />
      <TextField label="Approvals needed, high risk" value={high} onChangeText={setHigh} keyboardType="number-pad" testID="policy-quorum-high" error={quorumOf(high) === null ? bad : order} />
      <View style={styles.row}>
        <Switch value={requireCode} onValueChange={setRequireCode} testID="policy-require-code" accessibilityLabel="Decisions need a one-time code" />
        <Text style={styles.body}>Decisions need a one-time code</Text>
      </View>
      {error ? <Text style={styles.error} role="alert" testID="policy-error">{error}</Text> : null}
      {saved && !error ? <Text style={styles.muted} testID="policy-saved">Saved.</Text> : null}
      <Button
        label="Save policy" busy={saving} disabled={!valid} testID="policy-save"
        onPress={() => onSave({ signoffQuorumLow: quorumOf(low)!, signoffQuorumHigh: quorumOf(high)!, signoffRequireCode: requireCode })}
      />
    </Section>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  body: { ...type.body, color: colors.ink },
  muted: { ...type.caption, color: colors.inkMuted },
  error: { ...type.bodyStrong, color: colors.danger },
});
