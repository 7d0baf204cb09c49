// The steps of adding a one-time-code key, shared by the security page and the decision screen: open the key in
// the authenticator app on this phone, or scan the QR code from another device, or type the key; then prove it
// with the first code.
import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { SvgXml } from 'react-native-svg';
import type { OtpEnrolment } from '@/shared/signoff';
import { Button } from '@/components/button';
import { TextField } from '@/components/text-field';
import { OpenAuthenticator } from '@/components/signoff/open-authenticator';
import { colors, radii, space, type } from '@/constants/theme';

/** Big enough for a phone camera held at arm's length across a desk. */
const QR_SIZE_PX = 220;

/** Blocks of four, as authenticator apps print keys; they ignore the spaces when it is typed in. */
export const groupKey = (keyBase32: string) => keyBase32.replace(/(.{4})(?=.)/g, '$1 ');

type EntryProps = { label: string; action: string; busy: boolean; onSubmit: (code: string) => void; testID: string };

export function CodeEntry({ label, action, busy, onSubmit, testID }: EntryProps) {
  const [code, setCode] = useState('');
  return (
    <View style={styles.row}>
      <View style={styles.code}>
        <TextField
          label={label} value={code} onChangeText={setCode} keyboardType="number-pad" inputMode="numeric"
          autoComplete="one-time-code" maxLength={6} placeholder="6 digits" testID={`${testID}-code`}
        />
      </View>
      <Button label={action} onPress={() => onSubmit(code.trim())} busy={busy} disabled={!/^\d{6}$/.test(code.trim())} testID={`${testID}-submit`} />
    </View>
  );
}

export function OtpKeySteps({ enrolment, confirming, onConfirm }: { enrolment: OtpEnrolment; confirming: boolean; onConfirm: (code: string) => void }) {
  return (
    <View style={styles.block}>
      <Text style={styles.body}>1. Add the key to your authenticator app.</Text>
      <OpenAuthenticator uri={enrolment.uri} />
      <Text style={styles.muted}>On this phone, the button opens the app. Authenticator on another device? Scan this QR code with it.</Text>
      <View style={styles.qr} testID="otp-qr" accessibilityLabel="QR code of the one-time-code key">
        <SvgXml xml={enrolment.qrSvg} width={QR_SIZE_PX} height={QR_SIZE_PX} />
      </View>
      <Text style={styles.label}>Or copy the key and type it into the app</Text>
      <Text style={styles.key} selectable testID="otp-key">{groupKey(enrolment.keyBase32)}</Text>
      <Text style={styles.muted}>Time-based, 6 digits, every 30 seconds (SHA-1): the usual defaults.</Text>
      <Text style={styles.body}>2. Enter the code the app shows now.</Text>
      <CodeEntry label="Code from the app" action="Confirm" busy={confirming} onSubmit={onConfirm} testID="otp-confirm" />
    </View>
  );
}

const styles = StyleSheet.create({
  block: { gap: space.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-end', gap: space.sm },
  code: { minWidth: 160, flexGrow: 1 },
  qr: { alignSelf: 'flex-start', padding: space.sm, backgroundColor: colors.surface, borderRadius: radii.md, borderWidth: 1, borderColor: colors.border },
  label: { ...type.label, color: colors.inkMuted },
  key: { ...type.bodyStrong, color: colors.ink, letterSpacing: 1.5 },
  body: { ...type.body, color: colors.ink },
  muted: { ...type.caption, color: colors.inkMuted },
});
