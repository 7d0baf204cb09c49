// Keyboard focus ring for the web: one global :focus-visible rule, because react-native-web styles cannot hold
// pseudo-classes. Two bands, a light halo against the element and a dark ring outside it, so one of them shows on
// every surface (white, tide, the abyss rail, primary buttons). Keyboard focus only: a mouse click draws no ring.
import { colors } from '@/constants/theme';

export const FOCUS_RING_STYLE_ID = 'focus-ring-style';
export const FOCUS_RING_WIDTH_PX = 2;

export function focusRingCss(): string {
  const w = FOCUS_RING_WIDTH_PX;
  // WARNING: !important on purpose: react-native-web's atomic classes may set outline or box-shadow on the same
  // elements, and the ring must win while focus is there. The halo fills exactly the outline's offset.
  return [
    ':focus-visible {',
    `  outline: ${w}px solid ${colors.focusRing} !important;`,
    `  outline-offset: ${w}px !important;`,
    `  box-shadow: 0 0 0 ${w}px ${colors.focusHalo} !important;`,
    '}',
  ].join('\n');
}

type StyleHost = Pick<Document, 'getElementById' | 'createElement' | 'head'>;

/** Adds the rule once; later calls (fast refresh, a second mount) find it and leave it be. */
export function installFocusRing(doc: StyleHost | null = typeof document === 'undefined' ? null : document): void {
  if (!doc || doc.getElementById(FOCUS_RING_STYLE_ID)) return;
  const style = doc.createElement('style');
  style.id = FOCUS_RING_STYLE_ID;
  style.textContent = focusRingCss();
  doc.head.appendChild(style);
}
