// A key handler for react-native-web: react-native's Pressable and View types have no onKeyDown, while
// react-native-web passes it to the DOM element (and Testing Library's fireEvent finds it on the host view).

/** The part of a DOM keyboard event these handlers read. */
export type KeyPress = { key: string; preventDefault?: () => void };

/** Spread onto a Pressable or View: `{...keyDownProps(handler)}`. */
export function keyDownProps(handler: (event: KeyPress) => void): object {
  return { onKeyDown: handler };
}

/**
 * For a Pressable with role "link" and no href: react-native-web leaves Enter on it to the browser, which does
 * nothing without an href, so Enter (and Space, as on a button) call `open` here.
 */
export function linkKeyProps(open: () => void): object {
  return keyDownProps((event) => {
    if (event.key !== 'Enter' && event.key !== ' ' && event.key !== 'Spacebar') return;
    event.preventDefault?.();
    open();
  });
}
