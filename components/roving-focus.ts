// Keyboard inside a single-choice group (radio chips, sort choices): one Tab stop, arrow keys move and choose.
// Reference: WAI-ARIA Authoring Practices, "Radio Group" pattern and "roving tabindex".
import { useRef } from 'react';
import type { PressableProps, View } from 'react-native';

/** The index an arrow, Home or End key moves to from `index` among `count` items (wrapping); null for other keys. */
export function rovingTarget(key: string, index: number, count: number): number | null {
  if (count <= 0) return null;
  switch (key) {
    case 'ArrowRight':
    case 'ArrowDown':
      return (index + 1) % count;
    case 'ArrowLeft':
    case 'ArrowUp':
      return (index - 1 + count) % count;
    case 'Home':
      return 0;
    case 'End':
      return count - 1;
    default:
      return null;
  }
}

/** The one item Tab reaches: the checked one, or the first when none is checked. */
export function tabStopIndex(checkedIndex: number, count: number): number {
  return checkedIndex >= 0 && checkedIndex < count ? checkedIndex : 0;
}

/** What a key handler needs of a web keyboard event (React Native Web hands the DOM event through). */
export type KeyEventLike = { key?: string; nativeEvent?: { key?: string }; preventDefault?: () => void };

export const keyOf = (event: KeyEventLike): string => event.key ?? event.nativeEvent?.key ?? '';

/**
 * `onKeyDown` as a Pressable prop. React Native's types leave it out, while React Native Web passes it to the DOM
 * element; the cast stays in this one place.
 */
export function keyDownProps(handler: (event: KeyEventLike) => void): Partial<PressableProps> {
  return { onKeyDown: handler } as unknown as Partial<PressableProps>;
}

/**
 * Space toggles a checkbox or radio: React Native Web presses only Enter on elements that are not buttons.
 */
export function spaceActivates(onPress: () => void): Partial<PressableProps> {
  return keyDownProps((event) => {
    if (keyOf(event) !== ' ') return;
    event.preventDefault?.();
    onPress();
  });
}

type Focusable = { focus?: () => void } | null;

/**
 * Props for each item of a single-choice group: only the checked item (or the first) is in the Tab order; arrows,
 * Home and End choose the next item and move focus to it; Space chooses the focused one.
 */
export function useRovingChoice(count: number, checkedIndex: number, choose: (index: number) => void) {
  const nodes = useRef<Focusable[]>([]);
  const stop = tabStopIndex(checkedIndex, count);
  return (index: number): Partial<PressableProps> & { ref: (node: View | null) => void } => ({
    ref: (node) => {
      nodes.current[index] = node as Focusable;
    },
    tabIndex: index === stop ? 0 : -1,
    ...keyDownProps((event) => {
      const key = keyOf(event);
      if (key === ' ') {
        event.preventDefault?.();
        choose(index);
        return;
      }
      const next = rovingTarget(key, index, count);
      if (next === null || next === index) return;
      event.preventDefault?.();
      choose(next);
      nodes.current[next]?.focus?.();
    }),
  });
}
