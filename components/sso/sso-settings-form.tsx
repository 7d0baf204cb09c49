// Admin: the company's OpenID Connect issuer, the words on the sign-in button, which issuer groups give which
// staff roles, and whether staff may still sign in with a password. The client secret is written, never shown.
import { useState } from 'react';
import { StyleSheet, Switch, Text, View } from 'react-native';
import { ssoSettingsUpdateSchema, type SsoSettings, type SsoSettingsUpdate } from '@/shared/sso';
import { Button } from '@/components/button';
import { TextField } from '@/components/text-field';
import { Section } from '@/components/windows/section';
import { colors, space, type } from '@/constants/theme';
import { SsoGroupRolesEditor, type GroupRow } from './sso-group-roles-editor';

type Props = { settings: SsoSettings; saving: boolean; error: string | null; saved: boolean; onSave: (input: SsoSettingsUpdate) => void };

type Problems = Partial<Record<'issuerUrl' | 'clientId' | 'clientSecret' | 'displayName' | 'groupsClaim' | 'groupRoles', string>> & { groups: (string | undefined)[] };

function check(input: SsoSettingsUpdate, secretSet: boolean): { value: SsoSettingsUpdate | null; problems: Problems } {
  const problems: Problems = { groups: [] };
  if (!secretSet && !input.clientSecret) problems.clientSecret = 'Enter the client secret the issuer gave you';
  const parsed = ssoSettingsUpdateSchema.safeParse(input);
  if (!parsed.success) {
    for (const issue of parsed.error.issues) {
      const [field, index] = issue.path;
      if (field === 'groupRoles' && typeof index === 'number') problems.groups[index] ??= issue.message;
      else if (typeof field === 'string' && field !== 'groupRoles') problems[field as keyof Omit<Problems, 'groups'>] ??= issue.message;
      else problems.groupRoles ??= issue.message;
    }
  }
  const ok = parsed.success && !problems.clientSecret;
  return { value: ok ? parsed.data : null, problems };
}

export function SsoSettingsForm({ settings, saving, error, saved, onSave }: Props) {
  const [enabled, setEnabled] = useState(settings.enabled);
  const [issuerUrl, setIssuerUrl] = useState(settings.issuerUrl);
  const [clientId, setClientId] = useState(settings.clientId);
  const [clientSecret, setClientSecret] = useState('');
  const [displayName, setDisplayName] = useState(settings.displayName);
  const [groupsClaim, setGroupsClaim] = useState(settings.groupsClaim);
  const [groups, setGroups] = useState<GroupRow[]>(settings.groupRoles);
  const [passwordForStaff, setPasswordForStaff] = useState(settings.passwordSignInForStaff);
  const [tried, setTried] = useState(false);
  const input: SsoSettingsUpdate = {
    enabled, issuerUrl: issuerUrl.trim(), clientId, clientSecret: clientSecret === '' ? undefined : clientSecret, displayName,
    groupsClaim, groupRoles: groups, passwordSignInForStaff: passwordForStaff,
  };
  const { value, problems } = check(input, settings.clientSecretSet);
  const shown = tried ? problems : { groups: [] as (string | undefined)[] };
  const save = () => {
    setTried(true);
    if (value) onSave(value);
  };
  return (
    <View style={styles.form}>
      <Section title="Issuer" testID="sso-issuer">
        <View style={styles.row}>
          <Switch value={enabled} onValueChange={setEnabled} testID="sso-enabled" accessibilityLabel="Offer single sign-on on the sign-in screen" />
          <Text style={styles.body}>Offer single sign-on on the sign-in screen</Text>
        </View>
        <TextField label="Issuer address" value={issuerUrl} onChangeText={setIssuerUrl} testID="sso-issuer-url" autoCapitalize="none" autoCorrect={false} inputMode="url" error={shown.issuerUrl} />
        <Text style={styles.muted}>Slackwater reads the issuer&apos;s endpoints and keys from this address plus /.well-known/openid-configuration.</Text>
        <TextField label="Client ID" value={clientId} onChangeText={setClientId} testID="sso-client-id" autoCapitalize="none" autoCorrect={false} error={shown.clientId} />
        <TextField label="Client secret" value={clientSecret} onChangeText={setClientSecret} testID="sso-client-secret" secureTextEntry autoComplete="off" error={shown.clientSecret}
          placeholder={settings.clientSecretSet ? 'Set. Leave empty to keep it.' : undefined} />
        {settings.clientSecretSet ? <Text style={styles.muted} testID="sso-client-secret-set">A client secret is set. It is never shown again; type a new one to replace it.</Text> : null}
        <View testID="sso-redirect-uri">
          <Text style={styles.label}>Redirect URI to register at the issuer</Text>
          <Text style={styles.body} selectable>{settings.redirectUri}</Text>
        </View>
      </Section>
      <Section title="Sign-in button" testID="sso-button-words">
        <TextField label="Name on the button" value={displayName} onChangeText={setDisplayName} testID="sso-display-name" error={shown.displayName} />
        <Text style={styles.muted} testID="sso-button-preview">The sign-in screen reads: Sign in with {displayName.trim() || '…'}</Text>
      </Section>
      <Section title="Groups and roles" testID="sso-mapping">
        <TextField label="Claim that lists a person's groups" value={groupsClaim} onChangeText={setGroupsClaim} testID="sso-groups-claim" autoCapitalize="none" autoCorrect={false} error={shown.groupsClaim} />
        <Text style={styles.muted}>At every sign-in a person gets exactly the roles of their groups. In no listed group: no access. Tenant accounts never sign in this way.</Text>
        <SsoGroupRolesEditor rows={groups} onChange={setGroups} problems={shown.groups} />
        {shown.groupRoles ? <Text style={styles.error} role="alert">{shown.groupRoles}</Text> : null}
      </Section>
      <Section title="Passwords" testID="sso-passwords">
        <View style={styles.row}>
          <Switch value={passwordForStaff} onValueChange={setPasswordForStaff} testID="sso-password-staff" accessibilityLabel="Staff may also sign in with a password" />
          <Text style={styles.body}>Staff may also sign in with a password</Text>
        </View>
        <Text style={styles.muted}>Tenants always sign in with a password. Turning this off needs an admin who has signed in through the issuer at least once.</Text>
      </Section>
      {error ? <Text style={styles.error} role="alert" testID="sso-error">{error}</Text> : null}
      {saved && !error ? <Text style={styles.muted} role="status" testID="sso-saved">Saved.</Text> : null}
      <Button label="Save single sign-on" busy={saving} testID="sso-save" onPress={save} />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  label: { ...type.bodyStrong, color: colors.ink },
  body: { ...type.body, color: colors.ink },
  muted: { ...type.caption, color: colors.inkMuted },
  error: { ...type.bodyStrong, color: colors.danger },
});
