// Slackwater's design tokens: a calm, deep-sea palette, a 4-point spacing scale and a Work Sans type ramp.
// Screens and components take every colour, size and font from here, never from literals.
import type { TextStyle } from 'react-native';

export const colors = {
  /** Deep water: main text and the side rail. */
  abyss: '#0C2630',
  ink: '#16323C',
  inkMuted: '#4C6873',
  /** Captions and placeholders: the lightest text that still reads at 4.5:1 on surface and tide. */
  inkFaint: '#5B717A',
  /** Still water at the turn of the tide: the page background. */
  tide: '#EEF4F3',
  surface: '#FFFFFF',
  surfaceSunken: '#E2ECEA',
  /** Card and divider lines: decoration only, so no contrast minimum. */
  border: '#C9D9D7',
  /** Edges that identify a control (text inputs): 3:1 on surface and tide. */
  borderControl: '#758E91',
  primary: '#0D5C6B',
  primaryPressed: '#08434F',
  primarySoft: '#D3E8E7',
  onPrimary: '#FFFFFF',
  /** Buoy yellow-orange: selection marks and highlights. */
  buoy: '#D99A3D',
  /** Buoy deepened for selection marks on light surfaces (3:1 on surface, tide and primarySoft); buoy stays for the rail. */
  buoyDeep: '#AC7422',
  danger: '#A63A2B',
  dangerSoft: '#F6E0DC',
  warning: '#8A5A00',
  /** Text and icons on the dark rail. */
  onAbyss: '#DCEBEA',
  onAbyssMuted: '#8FB0B4',
  /** Keyboard focus: a dark ring outside a light halo, so one of the two shows on every surface. */
  focusRing: '#0C2630',
  focusHalo: '#FFFFFF',
} as const;

/** 4-point spacing scale; index names read as multiples of 4 px. */
export const space = { xxs: 2, xs: 4, sm: 8, md: 12, lg: 16, xl: 24, xxl: 32, xxxl: 48 } as const;

export const radii = { sm: 4, md: 8, lg: 14, pill: 999 } as const;

/** One family per weight: per-weight font files avoid faux bold on web and native. */
export const fonts = {
  regular: 'WorkSans_400Regular',
  medium: 'WorkSans_500Medium',
  semibold: 'WorkSans_600SemiBold',
  bold: 'WorkSans_700Bold',
} as const;

type TypeStyle = Pick<TextStyle, 'fontFamily' | 'fontSize' | 'lineHeight' | 'letterSpacing'>;

export const type = {
  display: { fontFamily: fonts.bold, fontSize: 28, lineHeight: 34, letterSpacing: -0.3 },
  title: { fontFamily: fonts.semibold, fontSize: 20, lineHeight: 26 },
  heading: { fontFamily: fonts.semibold, fontSize: 16, lineHeight: 22 },
  body: { fontFamily: fonts.regular, fontSize: 15, lineHeight: 22 },
  bodyStrong: { fontFamily: fonts.medium, fontSize: 15, lineHeight: 22 },
  label: { fontFamily: fonts.medium, fontSize: 13, lineHeight: 18, letterSpacing: 0.2 },
  caption: { fontFamily: fonts.regular, fontSize: 12, lineHeight: 16 },
  figure: { fontFamily: fonts.semibold, fontSize: 32, lineHeight: 38, letterSpacing: -0.5 },
} as const satisfies Record<string, TypeStyle>;

/** Window width (px) from which the shell shows a side rail instead of bottom tabs. */
export const WIDE_LAYOUT_MIN_WIDTH_PX = 900;

/** Widest a content column grows on large screens, so lines stay readable. */
export const CONTENT_MAX_WIDTH_PX = 1080;

/** Column of phone-first screens (sign-off, one-time codes) on large screens: still about a phone and a half. */
export const NARROW_CONTENT_MAX_WIDTH_PX = CONTENT_MAX_WIDTH_PX * 0.6;

// ── Map tokens (components/map) ────────────────────────────────────────────────
// Our own cartography: pale sand land on still water, spans and sites from cool (idle) to warm (full).
export const mapColors = {
  sea: '#E1ECEE',
  land: '#F5F1E6',
  coast: '#C2B89E',
  /**
   * Span and site utilisation bands, lowest first (components/map/colour-scale.ts has the thresholds). The hue turns
   * one way round the wheel, slate blue (idle) → teal → green → gold → orange → crimson (over capacity), and every
   * band reaches 3:1 against sea and land (WCAG 2.1 SC 1.4.11), so even an idle span stands out from the water.
   */
  utilisation: ['#6C7BA8', '#2E8796', '#4A8A3E', '#A0760F', '#C25A1F', '#9E2F3A'],
  /** Elements without a figure (no capacity known): a neutral grey, no hue, so it never reads as a band; 3:1 as well. */
  noFigure: '#7A7E80',
  siteStroke: '#0C2630',
  label: '#16323C',
  labelHalo: '#F5F1E6',
  /** Highlight tones: a slice's placement, a maintenance window's elements, an alternative route. */
  tonePlacement: '#3C3F9C',
  toneWindow: '#B2386F',
  toneAlternative: '#1D8757',
  /** The selected element's ring or casing: deep water, so it is never mistaken for a load band (13:1 on sea). */
  selection: '#0C2630',
} as const;

/** Opacity of elements outside a highlight, so the highlighted ones read first. */
export const MAP_DIMMED_OPACITY = 0.22;
// ── end of map tokens ──────────────────────────────────────────────────────────

// ── Calendar tokens (components/calendar, components/freezes) ─────────────────
// One tone per window status, in lifecycle order: cool while being worked out, green once cleared,
// violet while work is underway, muted once over; red-brown for a return or roll-back. Each carries white bar titles
// at 4.5:1, so the pale ends of the lifecycle are greys rather than washes.
export const calendarColors = {
  status: {
    draft: '#5F7982',
    assessed: '#437AA4',
    planned: '#3F5FAE',
    'in-review': '#946F23',
    cleared: '#2C8361',
    returned: '#B45D37',
    notified: '#1D7F8E',
    underway: '#7E45A6',
    done: '#667975',
    'rolled-back': '#9E2F3A',
    withdrawn: '#717678',
  },
  /** Freeze shading: a cool lavender wash with darker diagonal hatching, unlike any status tone. */
  freezeWash: '#ECE6F5',
  freezeHatch: '#B7A6D3',
  freezeInk: '#4F3F78',
  /** Today: a ring in deepened buoy (3:1 on the white cell), kept apart from the selection fill. */
  todayRing: '#AC7422',
  selectedFill: '#0D5C6B',
  onSelected: '#FFFFFF',
  /** Days outside the shown month. */
  outsideMonth: '#607981',
  /** Badges on windows: conflicts (danger) and a critical slice touched (caution). */
  conflict: '#A63A2B',
  conflictSoft: '#F6E0DC',
  critical: '#8A5A00',
  criticalSoft: '#F7EBD3',
} as const;

/** Most window bars a day cell draws; more show as "+n". */
export const CALENDAR_MAX_LANES = 3;
// ── end of calendar tokens ─────────────────────────────────────────────────────

export const theme = { colors, space, radii, fonts, type } as const;
