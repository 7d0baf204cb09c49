// A key handler for react-native-web: react-native's Pressable and View types have no onKeyDown, while
// react-native-web passes it to the DOM element (and Testing Library's fireEvent finds it on the host view).

/** The part of a DOM keyboard event the calendar reads. */
export type KeyPress = { key: string; preventDefault?: () => void };

/** Spread onto a Pressable or View: `{...keyDownProps(handler)}`. */
export function keyDownProps(handler: (event: KeyPress) => void): object {
  return { onKeyDown: handler };
}
