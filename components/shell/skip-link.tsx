// "Skip to content": the first Tab stop on every signed-in page, out of sight until focused, then shown over the
// top-left corner. It moves focus to the page's main content, past the navigation.
import { useState } from 'react';
import { Pressable, StyleSheet, Text } from 'react-native';
import { colors, radii, space, type } from '@/constants/theme';

// react-native-web renders a Pressable with an href as an <a>, which the browser activates with Enter (a div with
// role="link" would not be); href is not in React Native's types, hence the cast.
const anchorProps = { href: '#main-content' } as object;

export function SkipLink({ onSkip }: { onSkip: () => void }) {
  const [focused, setFocused] = useState(false);
  return (
    <Pressable
      testID="skip-link" role="link" {...anchorProps}
      // The shell moves focus itself; following the #fragment would also change the address.
      onPress={(event) => { event.preventDefault?.(); onSkip(); }}
      onFocus={() => setFocused(true)} onBlur={() => setFocused(false)}
      style={[styles.link, focused ? styles.shown : styles.hidden]}
    >
      <Text style={styles.label}>Skip to content</Text>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  link: {
    position: 'absolute', top: space.sm, left: space.sm, zIndex: 10,
    paddingVertical: space.sm, paddingHorizontal: space.md, borderRadius: radii.md,
    backgroundColor: colors.abyss, borderWidth: 2, borderColor: colors.buoy,
  },
  // Off-screen rather than display: none, so it stays in the Tab order and screen readers find it.
  hidden: { left: -10000, width: 1, height: 1, overflow: 'hidden' },
  shown: {},
  label: { ...type.bodyStrong, color: colors.onAbyss },
});
