// The frame of the plans screens: the page column with a way back, the page title and the window's next step.
import type { ReactNode } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { Button } from '@/components/button';
import { PageColumn } from '@/components/page-column';
import { colors, type } from '@/constants/theme';

type Props = {
  back: { label: string; onPress: () => void; testID: string };
  title: string;
  /** the window's next-step bar, under the title so the step is reachable from every plans screen */
  next?: ReactNode;
  children: ReactNode;
};

export function PlanPage({ back, title, next, children }: Props) {
  return (
    <PageColumn>
      <View style={styles.back}>
        <Button label={back.label} variant="quiet" onPress={back.onPress} testID={back.testID} />
      </View>
      <Text style={styles.title} role="heading" aria-level={1}>{title}</Text>
      {next}
      {children}
    </PageColumn>
  );
}

const styles = StyleSheet.create({
  back: { alignSelf: 'flex-start' },
  title: { ...type.title, color: colors.abyss },
});
