// The security page's one-time codes: start, add the key (otp-key-steps.tsx), prove it with a first code; or remove
// them. Inside a decision, enrolment runs in place instead (inline-otp-enrol.tsx).
import { StyleSheet, Text, View } from 'react-native';
import type { OtpEnrolment, OtpStatus } from '@/shared/signoff';
import { Button } from '@/components/button';
import { CodeEntry, OtpKeySteps } from '@/components/signoff/otp-key-steps';
import { formatInstant } from '@/components/time';
import { colors, space, type } from '@/constants/theme';

type Props = {
  status: OtpStatus;
  /** the reader's zone, for the day the codes were set up */
  timeZone: string;
  enrolment: OtpEnrolment | null;
  starting: boolean;
  confirming: boolean;
  removing: boolean;
  error: string | null;
  onStart: () => void;
  onConfirm: (code: string) => void;
  onRemove: (code: string) => void;
};

export function OtpEnrolmentView(props: Props) {
  const { status, enrolment } = props;
  return (
    <View style={styles.block}>
      <Text style={styles.title} role="heading" aria-level={2}>One-time codes</Text>
      <Text style={styles.body}>When the change board asks for it, each sign-off decision is confirmed with a code from an authenticator app on your phone.</Text>
      {props.error ? <Text style={styles.error} role="alert" testID="otp-error">{props.error}</Text> : null}
      {status.enrolled ? (
        <View style={styles.block} testID="otp-enrolled">
          <Text style={styles.strong}>Codes are set up{status.confirmedAt ? ` since ${formatInstant(status.confirmedAt, props.timeZone)}` : ''}.</Text>
          <Text style={styles.muted}>To remove them (for a new phone), confirm with a current code. Lost your phone? Ask an admin to reset them.</Text>
          <CodeEntry label="Current code" action="Remove codes" busy={props.removing} onSubmit={props.onRemove} testID="otp-remove" />
        </View>
      ) : enrolment ? (
        <View testID="otp-pending"><OtpKeySteps enrolment={enrolment} confirming={props.confirming} onConfirm={props.onConfirm} /></View>
      ) : (
        <Button label="Set up one-time codes" onPress={props.onStart} busy={props.starting} testID="otp-start" />
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  block: { gap: space.md },
  title: { ...type.title, color: colors.abyss },
  body: { ...type.body, color: colors.ink },
  strong: { ...type.bodyStrong, color: colors.ink },
  muted: { ...type.caption, color: colors.inkMuted },
  error: { ...type.bodyStrong, color: colors.danger },
});
