// "Open in your authenticator app": hands the otpauth:// link to the phone's authenticator app (native build).
// The web build (open-authenticator.web.tsx) renders a real link instead, so the browser passes it to the system.
import { Linking } from 'react-native';
import { Button } from '@/components/button';

export const OPEN_AUTHENTICATOR_LABEL = 'Open in your authenticator app';

export function OpenAuthenticator({ uri }: { uri: string }) {
  return <Button label={OPEN_AUTHENTICATOR_LABEL} onPress={() => void Linking.openURL(uri).catch(() => undefined)} testID="otp-open-authenticator" />;
}
