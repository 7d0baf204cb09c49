// "Open in your authenticator app" on the web: an anchor to the otpauth:// link, so a tap on a phone's browser
// hands it to the authenticator app on the same phone (window.open would only open an empty tab).
import { StyleSheet, Text } from 'react-native';
import { colors, radii, space, type } from '@/constants/theme';

export const OPEN_AUTHENTICATOR_LABEL = 'Open in your authenticator app';

export function OpenAuthenticator({ uri }: { uri: string }) {
  // react-native-web renders a Text with `href` as <a href>; the prop is web-only, so it is not in the native types.
  const anchor = { href: uri } as object;
  return (
    <Text {...anchor} role="link" style={styles.link} testID="otp-open-authenticator">{OPEN_AUTHENTICATOR_LABEL}</Text>
  );
}

const styles = StyleSheet.create({
  link: {
    ...type.bodyStrong, color: colors.onPrimary, backgroundColor: colors.primary, borderRadius: radii.md,
    paddingVertical: space.md, paddingHorizontal: space.lg, alignSelf: 'flex-start', textAlign: 'center',
    minHeight: 44, textDecorationLine: 'none',
  },
});
