// List and detail: side by side from WIDE_LAYOUT_MIN_WIDTH_PX, otherwise one at a time (list, then detail).
// On phones the list stays mounted while hidden, so its search, sort and scroll survive a visit to a detail, and
// the detail stays mounted while hidden too: it holds the area's navigator (a Slot), and a navigator unmounted and
// mounted again under the same route loops on its state (React error #185, "maximum update depth").
// One h1 per page: the list's title is the page's h1 while nothing is open, and steps down to h2 once a detail
// (with its own h1) is shown.
import { createContext, useContext, type ReactNode } from 'react';
import { StyleSheet, useWindowDimensions, View } from 'react-native';
import { colors, space, WIDE_LAYOUT_MIN_WIDTH_PX } from '@/constants/theme';

type Props = { list: ReactNode; detail: ReactNode; showDetail: boolean };

const ListHeadingLevel = createContext<1 | 2>(1);

/** The heading level for the list side's title (see above). */
export const useListHeadingLevel = () => useContext(ListHeadingLevel);

export function SplitView({ list, detail, showDetail }: Props) {
  const { width } = useWindowDimensions();
  if (width >= WIDE_LAYOUT_MIN_WIDTH_PX) {
    return (
      <View style={styles.wide} testID="split-wide">
        <View style={styles.listPane}><ListHeadingLevel.Provider value={showDetail ? 2 : 1}>{list}</ListHeadingLevel.Provider></View>
        <View style={styles.detailPane}>{detail}</View>
      </View>
    );
  }
  return (
    <View style={styles.narrow} testID="split-narrow">
      <View style={[styles.narrowPane, showDetail && styles.hidden]}>
        <ListHeadingLevel.Provider value={showDetail ? 2 : 1}>{list}</ListHeadingLevel.Provider>
      </View>
      <View style={[styles.narrowPane, !showDetail && styles.hidden]}>{detail}</View>
    </View>
  );
}

const styles = StyleSheet.create({
  wide: { flex: 1, flexDirection: 'row' },
  listPane: { flex: 6, minWidth: 360, padding: space.lg, paddingRight: space.sm },
  detailPane: { flex: 5, borderLeftWidth: 1, borderLeftColor: colors.border, backgroundColor: colors.surface },
  narrow: { flex: 1 },
  narrowPane: { flex: 1 },
  hidden: { display: 'none' },
});
