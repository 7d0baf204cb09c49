// The frame of the plans screens: the page column with a way back and the page title.
import type { ReactNode } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { Button } from '@/components/button';
import { PageColumn } from '@/components/page-column';
import { colors, type } from '@/constants/theme';

type Props = { back: { label: string; onPress: () => void; testID: string }; title: string; children: ReactNode };

export function PlanPage({ back, title, children }: Props) {
  return (
    <PageColumn>
      <View style={styles.back}>
        <Button label={back.label} variant="quiet" onPress={back.onPress} testID={back.testID} />
      </View>
      <Text style={styles.title} role="heading" aria-level={1}>{title}</Text>
      {children}
    </PageColumn>
  );
}

const styles = StyleSheet.create({
  back: { alignSelf: 'flex-start' },
  title: { ...type.title, color: colors.abyss },
});
