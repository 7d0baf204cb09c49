// The map's meaningful colours against what they are drawn on: every load band, the "no figure" grey, the highlight
// tones and the selection reach 3:1 against sea and land (and the legend's card), the bands stay in one order of hue,
// and the legend draws exactly the colours the map uses.
import { render, screen } from '@testing-library/react-native';
import { Line } from 'react-native-svg';
// Contrast ratio by the WCAG 2.1 relative-luminance formula ((L1 + 0.05) / (L2 + 0.05), sRGB channels linearised),
// from the published implementation the palette test already uses, not a formula of ours.
import { hex as contrastRatio } from 'wcag-contrast';
import { UTILISATION_BANDS, utilisationColour } from '@/components/map/colour-scale';
import { MapLegend } from '@/components/map/map-legend';
import { TONE_COLOURS } from '@/components/map/map-tones';
import { NON_TEXT_RATIO } from '@/constants/contrast-pairs';
import { colors, mapColors } from '@/constants/theme';

/** What the map draws on (the app has a light theme only), and the card the legend's swatches sit on. */
const BACKGROUNDS = { sea: mapColors.sea, land: mapColors.land, 'legend card': colors.surface } as const;

const MEANINGFUL: [string, string][] = [
  ...UTILISATION_BANDS.map((band): [string, string] => [`load band "${band.label}"`, band.colour]),
  ['no figure', mapColors.noFigure],
  ...Object.entries(TONE_COLOURS).map(([tone, colour]): [string, string] => [`highlight tone ${tone}`, colour]),
  ['selection', mapColors.selection],
];

const CASES = MEANINGFUL.flatMap(([use, colour]) =>
  Object.entries(BACKGROUNDS).map(([bgName, bg]) => [`${use} on ${bgName}`, colour, bg] as const));

test.each(CASES)('%s reaches 3:1 (WCAG 2.1 SC 1.4.11 non-text contrast)', (_use, colour, bg) => {
  expect(NON_TEXT_RATIO).toBe(3);
  expect(contrastRatio(colour, bg)).toBeGreaterThanOrEqual(NON_TEXT_RATIO);
});

test('the check fails the idle and light bands the map used to draw', () => {
  for (const faint of ['#C3D3D4', '#6FB3A6', '#D9A23D', '#9AA5A8']) {
    expect(contrastRatio(faint, mapColors.sea)).toBeLessThan(NON_TEXT_RATIO);
  }
});

/** HSL hue in degrees (0–360) of a #RRGGBB colour. */
function hueOf(hex: string): number {
  const [r, g, b] = [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16) / 255);
  const max = Math.max(r, g, b);
  const delta = max - Math.min(r, g, b);
  if (delta === 0) return 0;
  const h = max === r ? ((g - b) / delta) % 6 : max === g ? (b - r) / delta + 2 : (r - g) / delta + 4;
  return (h * 60 + 360) % 360;
}

test('low to high, the band hue turns one way round the wheel, from blue (idle) to red (over capacity)', () => {
  // Reds just below 360° count as just below 0°, so the sweep blue → teal → green → gold → orange → red is one run.
  const hues = UTILISATION_BANDS.map((band) => {
    const hue = hueOf(band.colour);
    return hue > 300 ? hue - 360 : hue;
  });
  expect(hues[0]).toBeGreaterThan(200);
  expect(hues[hues.length - 1]).toBeLessThan(10);
  hues.slice(1).forEach((hue, i) => expect(hue).toBeLessThan(hues[i]));
});

test('"no figure" is a neutral grey, so it is never read as a load band', () => {
  const [r, g, b] = [1, 3, 5].map((i) => parseInt(mapColors.noFigure.slice(i, i + 2), 16));
  expect(Math.max(r, g, b) - Math.min(r, g, b)).toBeLessThanOrEqual(8);
  expect(utilisationColour(null)).toBe(mapColors.noFigure);
});

test('the legend draws each band and the "no figure" grey in the colours the map uses', () => {
  render(<MapLegend />);
  const strokeIn = (testID: string) => screen.getByTestId(testID).findByType(Line).props.stroke;
  UTILISATION_BANDS.forEach((band) => {
    expect(strokeIn(`map-legend-band-${band.index}`)).toBe(utilisationColour((band.from + Math.min(band.to, 2)) / 2));
    expect(screen.getByText(band.label)).toBeTruthy();
  });
  expect(strokeIn('map-legend-no-figure')).toBe(mapColors.noFigure);
  expect(screen.getByText('no figure')).toBeTruthy();
});
