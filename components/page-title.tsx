// Each screen's name: the browser tab's title ("Calendar — Slackwater") and what the app shell announces after a
// move between pages. Screens call usePageTitle once, before any early return, with the best name they have so far
// (e.g. "Slice" while loading, then "Slice: Factory floor").
import { createContext, useContext, useEffect } from 'react';
import { StyleSheet, Text } from 'react-native';
import { colors, type } from '@/constants/theme';

export const APP_NAME = 'Slackwater';

/** The document title for a page title, e.g. "Calendar — Slackwater". */
export const documentTitle = (pageTitle: string) => `${pageTitle} — ${APP_NAME}`;

/** Set by the app shell to hear each screen's title; unset outside it (sign-in, unknown addresses). */
export const PageTitleContext = createContext<((pageTitle: string) => void) | null>(null);

export function usePageTitle(pageTitle: string): void {
  const report = useContext(PageTitleContext);
  useEffect(() => {
    // The web target only; native apps name the screen elsewhere.
    if (typeof document !== 'undefined') document.title = documentTitle(pageTitle);
    report?.(pageTitle);
  }, [pageTitle, report]);
}

/** "Slice: <name>" once the name is known, plain "Slice" before. */
export const titleWithName = (kind: string, name: string | null | undefined) => (name ? `${kind}: ${name}` : kind);

/** A page's one h1, for screens whose content has no title of its own. */
export function PageHeading({ children, testID }: { children: string; testID?: string }) {
  return <Text style={styles.heading} role="heading" aria-level={1} testID={testID}>{children}</Text>;
}

const styles = StyleSheet.create({ heading: { ...type.display, color: colors.abyss } });
