// "Your open sessions": the list of one's own sessions with loading, error and empty states, and
// "Sign out everywhere" behind a confirmation.
import { useState } from 'react';
import { ActivityIndicator, StyleSheet, Text, View } from 'react-native';
import type { SessionInfo } from '@/shared/sessions';
import { Button } from '@/components/button';
import { timesInLabel } from '@/components/time';
import { colors, space, type } from '@/constants/theme';
import { SessionRow } from './session-row';

export type SessionsSectionProps = {
  sessions: SessionInfo[] | undefined;
  loadError: string | null;
  onRetry: () => void;
  timeZone: string;
  endingId: string | null;
  onEnd: (id: string) => void;
  signingOutEverywhere: boolean;
  onSignOutEverywhere: () => void;
  actionError: string | null;
};

function SignOutEverywhere({ busy, onConfirm }: { busy: boolean; onConfirm: () => void }) {
  const [confirming, setConfirming] = useState(false);
  if (!confirming) return <Button label="Sign out everywhere" variant="quiet" onPress={() => setConfirming(true)} testID="sessions-sign-out-everywhere" />;
  return (
    <View style={styles.confirm} testID="sessions-confirm">
      <Text style={styles.warning}>Sign out on every device, this one included? You will need to sign in again here too.</Text>
      <View style={styles.buttons}>
        <Button label="Cancel" variant="quiet" onPress={() => setConfirming(false)} disabled={busy} testID="sessions-confirm-cancel" />
        <Button label="Sign out everywhere" busy={busy} onPress={onConfirm} testID="sessions-confirm-submit" />
      </View>
    </View>
  );
}

function Body(props: SessionsSectionProps) {
  const { sessions, loadError, timeZone } = props;
  if (loadError) {
    return (
      <View style={styles.state} testID="sessions-error" role="alert">
        <Text style={styles.warning}>Your sessions could not be loaded: {loadError}</Text>
        <Button label="Try again" variant="quiet" onPress={props.onRetry} />
      </View>
    );
  }
  if (!sessions) {
    return (
      <View style={styles.state} testID="sessions-loading" aria-busy>
        <ActivityIndicator color={colors.primary} aria-label="Loading your sessions" />
        <Text style={styles.muted}>Loading your sessions…</Text>
      </View>
    );
  }
  if (sessions.length === 0) return <Text style={styles.muted} testID="sessions-empty">No open sessions.</Text>;
  return (
    <View testID="sessions-list">
      <Text style={styles.muted}>{timesInLabel(timeZone)}.</Text>
      {sessions.map((session) => (
        <SessionRow key={session.id} session={session} timeZone={timeZone} ending={props.endingId === session.id} onEnd={props.onEnd} />
      ))}
    </View>
  );
}

export function SessionsSection(props: SessionsSectionProps) {
  return (
    <View style={styles.block}>
      <Text style={styles.title} role="heading" aria-level={2}>Your open sessions</Text>
      <Text style={styles.body}>Each browser you sign in with has its own session. Sign out any you do not recognise.</Text>
      {props.actionError ? <Text style={styles.warning} role="alert" testID="sessions-action-error">{props.actionError}</Text> : null}
      <Body {...props} />
      <SignOutEverywhere busy={props.signingOutEverywhere} onConfirm={props.onSignOutEverywhere} />
    </View>
  );
}

const styles = StyleSheet.create({
  block: { gap: space.md, marginTop: space.lg },
  state: { gap: space.sm, alignItems: 'flex-start' },
  confirm: { gap: space.sm },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  title: { ...type.title, color: colors.abyss },
  body: { ...type.body, color: colors.ink },
  muted: { ...type.caption, color: colors.inkMuted },
  warning: { ...type.bodyStrong, color: colors.danger },
});
