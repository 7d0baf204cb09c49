// Every foreground/background pair of theme colours the app draws, with the contrast ratio it must reach.
// Text needs 4.5:1 (WCAG 2.1 SC 1.4.3); control edges, the focus ring, selection marks and status swatches
// beside a label need 3:1 (SC 1.4.11). tests/app/contrast-pairs.test.tsx checks each pair.
import { calendarColors, colors, mapColors } from '@/constants/theme';

export const TEXT_RATIO = 4.5;
export const NON_TEXT_RATIO = 3;

export type ContrastPair = { use: string; fg: string; bg: string; minRatio: number };

type Named = Record<string, string>;

/** Every fg on every bg: for families of text that appear on every one of a family of panels. */
function each(use: string, fgs: Named, bgs: Named, minRatio: number): ContrastPair[] {
  return Object.entries(fgs).flatMap(([fgName, fg]) =>
    Object.entries(bgs).map(([bgName, bg]) => ({ use: `${use}: ${fgName} on ${bgName}`, fg, bg, minRatio })),
  );
}

/** Light panels text sits on: the page, cards, sunken wells, selected/soft rows, error and caution boxes. */
const LIGHT_PANELS: Named = {
  surface: colors.surface,
  tide: colors.tide,
  surfaceSunken: colors.surfaceSunken,
  primarySoft: colors.primarySoft,
  dangerSoft: colors.dangerSoft,
  criticalSoft: calendarColors.criticalSoft,
  conflictSoft: calendarColors.conflictSoft,
};

/** Text tokens used on any light panel. */
const PANEL_TEXT: Named = {
  ink: colors.ink,
  inkMuted: colors.inkMuted,
  abyss: colors.abyss,
  primary: colors.primary,
  danger: colors.danger,
  warning: colors.warning,
  critical: calendarColors.critical,
  conflict: calendarColors.conflict,
};

/** Page and card backgrounds, where captions, placeholders and plain outlines sit. */
const PAGE_AND_CARD: Named = { surface: colors.surface, tide: colors.tide };

/** Tones that carry white (onPrimary / onSelected) text: buttons, filled pills, bar titles, the selected day. */
const FILLED_WITH_WHITE: Named = {
  primary: colors.primary,
  primaryPressed: colors.primaryPressed,
  danger: colors.danger,
  selectedFill: calendarColors.selectedFill,
  ...Object.fromEntries(Object.entries(calendarColors.status).map(([status, tone]) => [`status ${status}`, tone])),
};

export const contrastPairs: readonly ContrastPair[] = [
  ...each('text on a light panel', PANEL_TEXT, LIGHT_PANELS, TEXT_RATIO),
  ...each('caption, placeholder or "no figure"', { inkFaint: colors.inkFaint }, PAGE_AND_CARD, TEXT_RATIO),
  ...each('white text on a filled tone', { onPrimary: colors.onPrimary }, FILLED_WITH_WHITE, TEXT_RATIO),
  { use: 'day outside the shown month', fg: calendarColors.outsideMonth, bg: colors.surface, minRatio: TEXT_RATIO },
  { use: 'freeze title in the agenda', fg: calendarColors.freezeInk, bg: calendarColors.freezeWash, minRatio: TEXT_RATIO },
  { use: 'badge count on buoy', fg: colors.abyss, bg: colors.buoy, minRatio: TEXT_RATIO },
  { use: 'side rail text', fg: colors.onAbyss, bg: colors.abyss, minRatio: TEXT_RATIO },
  { use: 'side rail muted text and icons', fg: colors.onAbyssMuted, bg: colors.abyss, minRatio: TEXT_RATIO },
  ...each('map label', { label: mapColors.label }, { labelHalo: mapColors.labelHalo, sea: mapColors.sea, land: mapColors.land }, TEXT_RATIO),

  ...each('text input edge', { borderControl: colors.borderControl }, PAGE_AND_CARD, NON_TEXT_RATIO),
  ...each('focused or invalid input edge, selected chip edge', { primary: colors.primary, danger: colors.danger }, PAGE_AND_CARD, NON_TEXT_RATIO),
  ...each('selection mark', { buoyDeep: colors.buoyDeep }, { ...PAGE_AND_CARD, primarySoft: colors.primarySoft }, NON_TEXT_RATIO),
  { use: 'active mark on the side rail', fg: colors.buoy, bg: colors.abyss, minRatio: NON_TEXT_RATIO },
  { use: "today's ring", fg: calendarColors.todayRing, bg: colors.surface, minRatio: NON_TEXT_RATIO },
  { use: 'conflict dot on a day', fg: calendarColors.conflict, bg: colors.surface, minRatio: NON_TEXT_RATIO },
  ...each('status swatch beside its label', Object.fromEntries(Object.entries(calendarColors.status)), PAGE_AND_CARD, NON_TEXT_RATIO),
  ...each('plan run swatch beside its label', { inkFaint: colors.inkFaint, inkMuted: colors.inkMuted }, PAGE_AND_CARD, NON_TEXT_RATIO),
  // The ring is two bands: the dark one shows on light surfaces, the light halo on dark ones.
  ...each('focus ring', { focusRing: colors.focusRing }, { ...PAGE_AND_CARD, primarySoft: colors.primarySoft, surfaceSunken: colors.surfaceSunken }, NON_TEXT_RATIO),
  ...each('focus halo', { focusHalo: colors.focusHalo }, { abyss: colors.abyss, primary: colors.primary, danger: colors.danger }, NON_TEXT_RATIO),
];

