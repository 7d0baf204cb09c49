// Approve or send back, with the required comment and, when the policy asks, a one-time code. An approver without
// codes sets them up right here (inline-otp-enrol.tsx); the comment and the decision pressed are kept meanwhile
// (decision-draft.tsx).
import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { SignoffDecisionBody, SignoffDecisionKind } from '@/shared/signoff';
import { Button } from '@/components/button';
import { TextField } from '@/components/text-field';
import { useDecisionDraft } from '@/components/signoff/decision-draft';
import { InlineOtpEnrol } from '@/components/signoff/inline-otp-enrol';
import { decisionErrorView } from '@/components/signoff/signoff-words';
import { colors, space, type } from '@/constants/theme';

type Props = {
  requireCode: boolean;
  /** the viewer has confirmed one-time codes (a code may then be given even when not required) */
  codeEnrolled: boolean;
  busy: boolean;
  error: unknown;
  onDecide: (body: SignoffDecisionBody) => void;
  /** Still passed by the summary view; not called: codes are set up in place, never on another screen. */
  onEnrol?: () => void;
};

const BUTTON_WORDS: Record<SignoffDecisionKind, string> = { approve: 'Approve', 'send-back': 'Send back' };

function nextStep(choice: SignoffDecisionKind | null): string {
  const press = choice ? `press ${BUTTON_WORDS[choice]}` : 'decide';
  return `Codes are set up. Enter the next code your app shows (each code works once) and ${press}.`;
}

export function DecisionForm({ requireCode, codeEnrolled, busy, error, onDecide }: Props) {
  const [draft, update] = useDecisionDraft();
  // Checked here first so a phone user hears at once, without a round trip; the server checks again.
  const [local, setLocal] = useState<{ comment?: string; code?: string }>({});
  const failure = decisionErrorView(error);
  const needsEnrolment = requireCode && !codeEnrolled;
  const decide = (decision: SignoffDecisionKind) => {
    const { comment, code } = draft;
    const problems = {
      comment: comment.trim() === '' ? 'Say why in a comment; the board and the planner read it.' : undefined,
      code: requireCode && !needsEnrolment && !/^\d{6}$/.test(code.trim()) ? 'Enter the 6 digits your authenticator app shows.' : undefined,
    };
    setLocal(problems);
    update({ choice: decision });
    if (problems.comment || problems.code || needsEnrolment) return;
    onDecide({ decision, comment: comment.trim(), ...(code.trim() ? { code: code.trim() } : {}) });
  };
  const codeError = local.code ?? (failure?.field === 'code' ? failure.message : undefined);
  const commentError = local.comment ?? (failure?.field === 'comment' ? failure.message : undefined);
  const prompt = needsEnrolment && draft.choice
    ? `To ${draft.choice === 'approve' ? 'approve' : 'send back'}, set up codes first; your comment is kept.` : null;
  return (
    <View style={styles.form} testID="signoff-decision-form">
      <TextField
        label="Comment (required)" value={draft.comment} onChangeText={(comment) => update({ comment })} multiline numberOfLines={3}
        placeholder="What you checked, or what must change" testID="signoff-comment"
        error={commentError}
      />
      {needsEnrolment ? <InlineOtpEnrol prompt={prompt} onEnrolled={() => update({ enrolledHere: true, code: '' })} /> : null}
      {codeEnrolled && draft.enrolledHere ? (
        <Text style={styles.next} role="status" testID="signoff-enrolled-here">
          {nextStep(draft.choice)}
        </Text>
      ) : null}
      {!needsEnrolment && (requireCode || codeEnrolled) ? (
        <TextField
          label={requireCode ? 'One-time code (required)' : 'One-time code (optional)'} value={draft.code} onChangeText={(code) => update({ code })}
          keyboardType="number-pad" inputMode="numeric" autoComplete="one-time-code" maxLength={6}
          placeholder="6 digits" testID="signoff-code" error={codeError}
        />
      ) : null}
      {failure && failure.field === null ? <Text style={styles.error} role="alert" testID="signoff-decision-error">{failure.message}</Text> : null}
      <View style={styles.row}>
        <Button
          label="Approve" variant={draft.choice === 'send-back' ? 'quiet' : 'primary'} onPress={() => decide('approve')}
          busy={busy && draft.choice === 'approve'} disabled={busy} testID="signoff-approve"
        />
        <Button
          label="Send back" variant={draft.choice === 'send-back' ? 'primary' : 'quiet'} onPress={() => decide('send-back')}
          busy={busy && draft.choice === 'send-back'} disabled={busy} testID="signoff-send-back"
        />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
  next: { ...type.bodyStrong, color: colors.primary },
  error: { ...type.bodyStrong, color: colors.danger },
});
