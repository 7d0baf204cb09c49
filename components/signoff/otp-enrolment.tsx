// Setting up one-time codes: start, scan the QR code (or type the key), prove it with a first code; or remove them.
import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { SvgXml } from 'react-native-svg';
import type { OtpEnrolment, OtpStatus } from '@/shared/signoff';
import { Button } from '@/components/button';
import { TextField } from '@/components/text-field';
import { colors, radii, space, type } from '@/constants/theme';

/** Big enough for a phone camera held at arm's length across a desk. */
const QR_SIZE_PX = 220;

/** Blocks of four, as authenticator apps print keys; they ignore the spaces when it is typed in. */
export const groupKey = (keyBase32: string) => keyBase32.replace(/(.{4})(?=.)/g, '$1 ');

type Props = {
  status: OtpStatus;
  enrolment: OtpEnrolment | null;
  starting: boolean;
  confirming: boolean;
  removing: boolean;
  error: string | null;
  onStart: () => void;
  onConfirm: (code: string) => void;
  onRemove: (code: string) => void;
};

function CodeEntry({ label, action, busy, onSubmit, testID }: { label: string; action: string; busy: boolean; onSubmit: (code: string) => void; testID: string }) {
  const [code, setCode] = useState('');
  return (
    <View style={styles.row}>
      <View style={styles.code}>
        <TextField label={label} value={code} onChangeText={setCode} keyboardType="number-pad" inputMode="numeric" maxLength={6} placeholder="6 digits" testID={`${testID}-code`} />
      </View>
      <Button label={action} onPress={() => onSubmit(code.trim())} busy={busy} disabled={!/^\d{6}$/.test(code.trim())} testID={`${testID}-submit`} />
    </View>
  );
}

function Pending({ enrolment, confirming, onConfirm }: { enrolment: OtpEnrolment; confirming: boolean; onConfirm: (code: string) => void }) {
  return (
    <View style={styles.block} testID="otp-pending">
      <Text style={styles.body}>1. Scan this code with your authenticator app, or type the key below into it.</Text>
      <View style={styles.qr} testID="otp-qr" accessibilityLabel="QR code of the one-time-code key">
        <SvgXml xml={enrolment.qrSvg} width={QR_SIZE_PX} height={QR_SIZE_PX} />
      </View>
      <Text style={styles.label}>Key</Text>
      <Text style={styles.key} selectable testID="otp-key">{groupKey(enrolment.keyBase32)}</Text>
      <Text style={styles.muted}>Time-based, 6 digits, every 30 seconds (SHA-1): the usual defaults.</Text>
      <Text style={styles.body}>2. Enter the code the app shows now.</Text>
      <CodeEntry label="Code from the app" action="Confirm" busy={confirming} onSubmit={onConfirm} testID="otp-confirm" />
    </View>
  );
}

export function OtpEnrolmentView(props: Props) {
  const { status, enrolment } = props;
  return (
    <View style={styles.block}>
      <Text style={styles.title} role="heading" aria-level={1}>One-time codes</Text>
      <Text style={styles.body}>When the change board asks for it, each sign-off decision is confirmed with a code from an authenticator app on your phone.</Text>
      {props.error ? <Text style={styles.error} role="alert" testID="otp-error">{props.error}</Text> : null}
      {status.enrolled ? (
        <View style={styles.block} testID="otp-enrolled">
          <Text style={styles.strong}>Codes are set up{status.confirmedAt ? ` since ${status.confirmedAt.slice(0, 10)}` : ''}.</Text>
          <Text style={styles.muted}>To remove them (for a new phone), confirm with a current code. Lost your phone? Ask an admin to reset them.</Text>
          <CodeEntry label="Current code" action="Remove codes" busy={props.removing} onSubmit={props.onRemove} testID="otp-remove" />
        </View>
      ) : enrolment ? (
        <Pending enrolment={enrolment} confirming={props.confirming} onConfirm={props.onConfirm} />
      ) : (
        <Button label="Set up one-time codes" onPress={props.onStart} busy={props.starting} testID="otp-start" />
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  block: { gap: space.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-end', gap: space.sm },
  code: { minWidth: 160, flexGrow: 1 },
  qr: { alignSelf: 'flex-start', padding: space.sm, backgroundColor: colors.surface, borderRadius: radii.md, borderWidth: 1, borderColor: colors.border },
  title: { ...type.title, color: colors.abyss },
  label: { ...type.label, color: colors.inkMuted },
  key: { ...type.bodyStrong, color: colors.ink, letterSpacing: 1.5 },
  body: { ...type.body, color: colors.ink },
  strong: { ...type.bodyStrong, color: colors.ink },
  muted: { ...type.caption, color: colors.inkMuted },
  error: { ...type.bodyStrong, color: colors.danger },
});
