// Sideways chip rows: a fade and arrow at a clipped edge, only while chips are hidden past it.
import { fireEvent, render, screen } from '@testing-library/react-native';
import { ScrollView, Text } from 'react-native';
import { ChipRow, clippedEdges } from '@/components/chip-row';

test('no hint when everything fits; an end hint when chips run past the right; both in the middle; start only at the end', () => {
  expect(clippedEdges(300, 280, 0)).toEqual({ start: false, end: false });
  expect(clippedEdges(300, 301, 0)).toEqual({ start: false, end: false });
  expect(clippedEdges(300, 600, 0)).toEqual({ start: false, end: true });
  expect(clippedEdges(300, 600, 150)).toEqual({ start: true, end: true });
  expect(clippedEdges(300, 600, 300)).toEqual({ start: true, end: false });
  expect(clippedEdges(0, 600, 0)).toEqual({ start: false, end: false });
});

function renderRow() {
  render(
    <ChipRow testID="row">
      {['One', 'Two', 'Three', 'Four'].map((label) => <Text key={label}>{label}</Text>)}
    </ChipRow>,
  );
  return screen.UNSAFE_getByType(ScrollView);
}

/** The edge hints are drawn for eyes only (aria-hidden), so queries must be told to look at hidden elements. */
const HIDDEN = { includeHiddenElements: true };

test('the row shows its hints from measured sizes and follows scrolling', () => {
  const scroller = renderRow();
  expect(screen.queryByTestId('row-more-after', HIDDEN)).toBeNull();
  fireEvent(scroller, 'layout', { nativeEvent: { layout: { width: 200, height: 40, x: 0, y: 0 } } });
  fireEvent(scroller, 'contentSizeChange', 180, 40);
  expect(screen.queryByTestId('row-more-after', HIDDEN)).toBeNull();
  fireEvent(scroller, 'contentSizeChange', 420, 40);
  expect(screen.getByTestId('row-more-after', HIDDEN)).toBeTruthy();
  expect(screen.queryByTestId('row-more-after')).toBeNull();
  expect(screen.queryByTestId('row-more-before', HIDDEN)).toBeNull();
  fireEvent.scroll(scroller, { nativeEvent: { contentOffset: { x: 220, y: 0 } } });
  expect(screen.getByTestId('row-more-before', HIDDEN)).toBeTruthy();
  expect(screen.queryByTestId('row-more-after', HIDDEN)).toBeNull();
});
