// The frame of every inventory detail: a back link on phones, a kicker and title, then scrolling sections.
import type { ReactNode } from 'react';
import { Link, type Href } from 'expo-router';
import { Pressable, ScrollView, StyleSheet, Text, useWindowDimensions, View } from 'react-native';
import { colors, radii, space, type, WIDE_LAYOUT_MIN_WIDTH_PX } from '@/constants/theme';

type Props = { kicker: string; title: string; backHref: Href; backLabel: string; badges?: ReactNode; children: ReactNode; testID: string };

export function DetailFrame({ kicker, title, backHref, backLabel, badges, children, testID }: Props) {
  const { width } = useWindowDimensions();
  const wide = width >= WIDE_LAYOUT_MIN_WIDTH_PX;
  return (
    <ScrollView contentContainerStyle={styles.page} testID={testID}>
      {wide ? null : (
        <Link href={backHref} asChild>
          <Pressable role="link" testID="detail-back" style={styles.back}>
            <Text style={styles.backText}>{`‹ ${backLabel}`}</Text>
          </Pressable>
        </Link>
      )}
      <View style={styles.head}>
        <Text style={styles.kicker}>{kicker}</Text>
        <Text style={styles.title} role="heading" aria-level={1} testID={`${testID}-title`}>
          {title}
        </Text>
        {badges ? <View style={styles.badges}>{badges}</View> : null}
      </View>
      {children}
    </ScrollView>
  );
}

export function Section({ title, children, testID }: { title: string; children: ReactNode; testID?: string }) {
  return (
    <View style={styles.section} testID={testID}>
      <Text style={styles.sectionTitle} role="heading" aria-level={2}>
        {title}
      </Text>
      {children}
    </View>
  );
}

/** Label/value pairs that wrap into as many columns as fit. */
export function Facts({ items }: { items: { label: string; value: ReactNode }[] }) {
  return (
    <View style={styles.facts}>
      {items.map(({ label, value }) => (
        <View key={label} style={styles.fact}>
          <Text style={styles.factLabel}>{label}</Text>
          {typeof value === 'string' || typeof value === 'number' ? <Text style={styles.factValue}>{value}</Text> : value}
        </View>
      ))}
    </View>
  );
}

export function Note({ children }: { children: ReactNode }) {
  return <Text style={styles.note}>{children}</Text>;
}

const styles = StyleSheet.create({
  page: { padding: space.lg, gap: space.lg, paddingBottom: space.xxxl },
  back: { alignSelf: 'flex-start', paddingVertical: space.xs, minHeight: 36, justifyContent: 'center' },
  backText: { ...type.bodyStrong, color: colors.primary },
  head: { gap: space.xxs },
  kicker: { ...type.label, color: colors.inkMuted },
  title: { ...type.title, color: colors.abyss },
  badges: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs, marginTop: space.xs },
  section: { gap: space.sm },
  sectionTitle: { ...type.heading, color: colors.ink },
  facts: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    rowGap: space.md,
    columnGap: space.xl,
    backgroundColor: colors.tide,
    borderRadius: radii.lg,
    padding: space.md,
  },
  fact: { minWidth: 120, gap: space.xxs },
  factLabel: { ...type.caption, color: colors.inkMuted },
  factValue: { ...type.bodyStrong, color: colors.ink },
  note: { ...type.body, color: colors.inkMuted },
});
