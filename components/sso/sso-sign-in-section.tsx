// On the sign-in screen: why the last single sign-on came back (if it did), and "Sign in with <name>" when an
// admin set single sign-on up. The button is a full page load: the issuer's pages are not part of the app.
import { useLocalSearchParams } from 'expo-router';
import { StyleSheet, Text, View } from 'react-native';
import { AlertBanner } from '@/components/alert-banner';
import { Button } from '@/components/button';
import { SSO_START_PATH, useSsoButtonQuery } from '@/hooks/queries/sso';
import { colors, space, type } from '@/constants/theme';
import { ssoErrorMessage } from './sso-error-messages';

function goToIssuer(): void {
  globalThis.location?.assign(SSO_START_PATH);
}

/** Reads `?sso_error=` from the address itself, so the sign-in screen only places it. */
export function SsoSignInSection({ onStart = goToIssuer, orText = 'or with your e-mail and password' }: { onStart?: () => void; orText?: string }) {
  const { sso_error: errorCode } = useLocalSearchParams<{ sso_error?: string }>();
  const button = useSsoButtonQuery();
  const message = ssoErrorMessage(errorCode);
  const offered = button.data?.enabled === true && button.data.displayName !== null;
  if (!message && !offered) return null;
  return (
    <View style={styles.section}>
      {message ? <AlertBanner message={message} testID="sso-sign-in-error" /> : null}
      {offered ? (
        <>
          <Button label={`Sign in with ${button.data!.displayName}`} variant="quiet" testID="sso-sign-in" onPress={onStart} />
          <Text style={styles.or}>{orText}</Text>
        </>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  section: { gap: space.md },
  or: { ...type.caption, color: colors.inkMuted, textAlign: 'center' },
});
