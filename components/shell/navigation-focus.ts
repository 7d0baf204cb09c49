// After a move to another page, keyboard focus goes to that page's one h1, so a keyboard or screen-reader user
// starts at the top of the new content instead of on the navigation link they pressed. The first page shown after
// loading keeps focus where the browser put it (the skip link is then the first Tab stop).
import { useEffect, useRef, useState } from 'react';

/** The parts of a DOM element this needs (react-native-web hands the DOM node to a ref on web). */
export type HeadingNode = {
  focus: () => void;
  hasAttribute: (name: string) => boolean;
  setAttribute: (name: string, value: string) => void;
  getClientRects: () => { length: number };
};
export type HeadingRoot = { querySelectorAll: (selector: string) => ArrayLike<HeadingNode> };

/** The first shown h1 under `root`: a phone's split view keeps its hidden pane mounted (display: none). */
export function findPageHeading(root: HeadingRoot): HeadingNode | null {
  return Array.from(root.querySelectorAll('h1')).find((heading) => heading.getClientRects().length > 0) ?? null;
}

/** Focus the heading without making it a Tab stop (tabindex -1 lets a script focus it, not the Tab key). */
export function focusHeading(heading: HeadingNode): void {
  if (!heading.hasAttribute('tabindex')) heading.setAttribute('tabindex', '-1');
  heading.focus();
}

const isHeadingRoot = (node: unknown): node is HeadingRoot =>
  typeof node === 'object' && node !== null && typeof (node as HeadingRoot).querySelectorAll === 'function';

const activeElement = (): unknown => (typeof document === 'undefined' ? null : document.activeElement);
const bodyElement = (): unknown => (typeof document === 'undefined' ? null : document.body);

/**
 * Whether the person has pressed a key or pointed since the shell mounted. On a fresh load the router may settle
 * its address after the first render; such a change is not a move the person made and keeps focus where it is.
 * Without a DOM (native, tests) every change counts.
 */
function useHasInteracted() {
  const interacted = useRef(typeof document === 'undefined');
  useEffect(() => {
    if (typeof document === 'undefined') return undefined;
    const mark = () => { interacted.current = true; };
    document.addEventListener('keydown', mark, true);
    document.addEventListener('pointerdown', mark, true);
    return () => {
      document.removeEventListener('keydown', mark, true);
      document.removeEventListener('pointerdown', mark, true);
    };
  }, []);
  return interacted;
}

/**
 * On every pathname change the person caused, focus the new page's h1 under `getRoot()`. A page still loading has
 * none yet: then watch the content and focus the h1 when it appears, unless the user has moved focus meanwhile.
 * Returns whether a move has happened since mount (the shell announces page titles only after one).
 */
export function useFocusHeadingOnNavigation(pathname: string, getRoot: () => unknown): boolean {
  const shownPath = useRef(pathname);
  const interacted = useHasInteracted();
  const [navigated, setNavigated] = useState(false);
  useEffect(() => {
    if (shownPath.current === pathname) return undefined;
    shownPath.current = pathname;
    if (!interacted.current) return undefined;
    setNavigated(true);
    const root = getRoot();
    if (!isHeadingRoot(root)) return undefined;
    const heading = findPageHeading(root);
    if (heading) {
      focusHeading(heading);
      return undefined;
    }
    if (typeof MutationObserver === 'undefined') return undefined;
    const focusedAtMove = activeElement();
    const observer = new MutationObserver(() => {
      const appeared = findPageHeading(root);
      if (!appeared) return;
      observer.disconnect();
      const now = activeElement();
      if (now === focusedAtMove || now === bodyElement() || now === null) focusHeading(appeared);
    });
    observer.observe(root as unknown as Node, { childList: true, subtree: true });
    return () => observer.disconnect();
  }, [pathname, getRoot, interacted]);
  return navigated;
}
