// Approve or send back, with the required comment and, when the policy asks, a one-time code.
import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { SignoffDecisionBody, SignoffDecisionKind } from '@/shared/signoff';
import { Button } from '@/components/button';
import { TextField } from '@/components/text-field';
import { decisionErrorView } from '@/components/signoff/signoff-words';
import { colors, space, type } from '@/constants/theme';

type Props = {
  requireCode: boolean;
  /** the viewer has confirmed one-time codes (a code may then be given even when not required) */
  codeEnrolled: boolean;
  busy: boolean;
  error: unknown;
  onDecide: (body: SignoffDecisionBody) => void;
  onEnrol: () => void;
};

export function DecisionForm({ requireCode, codeEnrolled, busy, error, onDecide, onEnrol }: Props) {
  const [comment, setComment] = useState('');
  const [code, setCode] = useState('');
  // Checked here first so a phone user hears at once, without a round trip; the server checks again.
  const [local, setLocal] = useState<{ comment?: string; code?: string }>({});
  const failure = decisionErrorView(error);
  const decide = (decision: SignoffDecisionKind) => {
    const problems = {
      comment: comment.trim() === '' ? 'Say why in a comment; the board and the planner read it.' : undefined,
      code: requireCode && !/^\d{6}$/.test(code.trim()) ? 'Enter the 6 digits your authenticator app shows.' : undefined,
    };
    setLocal(problems);
    if (problems.comment || problems.code) return;
    onDecide({ decision, comment: comment.trim(), ...(code.trim() ? { code: code.trim() } : {}) });
  };
  const codeError = local.code ?? (failure?.field === 'code' ? failure.message : undefined);
  const commentError = local.comment ?? (failure?.field === 'comment' ? failure.message : undefined);
  return (
    <View style={styles.form} testID="signoff-decision-form">
      <TextField
        label="Comment (required)" value={comment} onChangeText={setComment} multiline numberOfLines={3}
        placeholder="What you checked, or what must change" testID="signoff-comment"
        error={commentError}
      />
      {requireCode || codeEnrolled ? (
        <TextField
          label={requireCode ? 'One-time code (required)' : 'One-time code (optional)'} value={code} onChangeText={setCode}
          keyboardType="number-pad" inputMode="numeric" autoComplete="one-time-code" maxLength={6}
          placeholder="6 digits" testID="signoff-code" error={codeError}
        />
      ) : null}
      {requireCode && !codeEnrolled ? (
        <View style={styles.row}>
          <Text style={styles.warn}>Decisions need a one-time code, and you have not set codes up yet.</Text>
          <Button label="Set up codes" variant="quiet" onPress={onEnrol} testID="signoff-enrol" />
        </View>
      ) : null}
      {failure && failure.field === null ? <Text style={styles.error} role="alert" testID="signoff-decision-error">{failure.message}</Text> : null}
      <View style={styles.row}>
        <Button label="Approve" onPress={() => decide('approve')} busy={busy} testID="signoff-approve" />
        <Button label="Send back" variant="quiet" onPress={() => decide('send-back')} disabled={busy} testID="signoff-send-back" />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
  warn: { ...type.body, color: colors.warning, flexShrink: 1 },
  error: { ...type.bodyStrong, color: colors.danger },
});
