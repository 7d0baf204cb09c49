// The frame of the plans screens: a centred, scrolling column with a way back and the page title.
import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, Text, View } from 'react-native';
import { Button } from '@/components/button';
import { colors, CONTENT_MAX_WIDTH_PX, space, type } from '@/constants/theme';

type Props = { back: { label: string; onPress: () => void; testID: string }; title: string; children: ReactNode };

export function PlanPage({ back, title, children }: Props) {
  return (
    <ScrollView contentContainerStyle={styles.page}>
      <View style={styles.column}>
        <View style={styles.back}>
          <Button label={back.label} variant="quiet" onPress={back.onPress} testID={back.testID} />
        </View>
        <Text style={styles.title} role="heading" aria-level={1}>{title}</Text>
        {children}
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  page: { padding: space.lg, alignItems: 'center' },
  column: { width: '100%', maxWidth: CONTENT_MAX_WIDTH_PX, gap: space.md },
  back: { alignSelf: 'flex-start' },
  title: { ...type.title, color: colors.abyss },
});
