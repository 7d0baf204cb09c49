// "Your time zone" on the Security screen: every screen shows times in the zone chosen here (staff and tenants).
import { useState } from 'react';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { Button } from '@/components/button';
import { TextField } from '@/components/text-field';
import { describeZone } from '@/components/time';
import { zoneSuggestions } from '@/components/time/zone-choices';
import { useMeQuery, useTimeZoneMutation } from '@/hooks/queries/me';
import { isValidTimeZone, NETWORK_TIME_ZONE } from '@/shared/time-zone';
import { colors, radii, space, type } from '@/constants/theme';

export function TimeZoneSection() {
  const me = useMeQuery();
  const save = useTimeZoneMutation();
  const current = me.data?.timeZone ?? NETWORK_TIME_ZONE;
  const [typed, setTyped] = useState<string | null>(null);
  const draft = typed ?? current;
  const [error, setError] = useState<string | null>(null);
  const submit = (zone: string | null) => {
    if (zone !== null && !isValidTimeZone(zone.trim())) {
      setError('Not a known time zone; use a name such as Europe/Oslo or America/New_York.');
      return;
    }
    setError(null);
    save.mutate({ timeZone: zone === null ? null : zone.trim() }, { onSuccess: () => setTyped(null) });
  };
  const serverError = save.error ? `Your zone was not saved: ${save.error.message}` : null;
  return (
    <View style={styles.block} testID="time-zone-section">
      <Text style={styles.title} role="heading" aria-level={2}>Your time zone</Text>
      <Text style={styles.body} testID="time-zone-current">
        {`Every screen shows times in ${describeZone(current)}${me.data?.timeZoneChosen ? '' : ' until you choose your own'}, with UTC beside them where it helps.`}
      </Text>
      <TextField
        label="Time zone (a name such as Europe/Oslo)" value={draft} testID="time-zone-field"
        autoCapitalize="none" autoCorrect={false} error={error ?? serverError ?? undefined}
        onChangeText={(next) => { setTyped(next); if (error) setError(null); }}
        onSubmitEditing={() => submit(draft)}
      />
      <View style={styles.chips}>
        {zoneSuggestions(typed ?? '').map((zone) => (
          <Pressable key={zone} role="button" onPress={() => { setTyped(zone); setError(null); }} style={styles.chip}
            testID={`time-zone-suggestion-${zone}`}>
            <Text style={styles.chipText}>{describeZone(zone)}</Text>
          </Pressable>
        ))}
      </View>
      <View style={styles.buttons}>
        <Button label="Save time zone" onPress={() => submit(draft)} busy={save.isPending} disabled={draft.trim() === current} testID="time-zone-save" />
        {me.data?.timeZoneChosen ? (
          <Button label="Use the network's zone" variant="quiet" onPress={() => submit(null)} disabled={save.isPending} testID="time-zone-reset" />
        ) : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  block: { gap: space.md, marginTop: space.lg },
  title: { ...type.title, color: colors.abyss },
  body: { ...type.body, color: colors.ink },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  chip: { borderWidth: 1, borderColor: colors.border, borderRadius: radii.pill, paddingHorizontal: space.md, paddingVertical: space.xs, backgroundColor: colors.surface },
  chipText: { ...type.caption, color: colors.primary },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
