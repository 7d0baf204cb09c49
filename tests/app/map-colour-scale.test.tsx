// The stepped utilisation scale: band edges, out-of-range figures, colours from the theme, and the highlight rules.
import fc from 'fast-check';
import { formatUtilisation, UTILISATION_BANDS, utilisationBand, utilisationColour } from '@/components/map/colour-scale';
import { emphasisFor } from '@/components/map/map-highlight';
import { mapColors } from '@/constants/theme';

test('each edge belongs to the band above it', () => {
  expect(utilisationBand(0)?.label).toBe('idle');
  expect(utilisationBand(0.0099)?.index).toBe(0);
  expect(utilisationBand(0.01)?.index).toBe(1);
  expect(utilisationBand(0.2999)?.index).toBe(1);
  expect(utilisationBand(0.3)?.index).toBe(2);
  expect(utilisationBand(0.6)?.index).toBe(3);
  expect(utilisationBand(0.8)?.index).toBe(4);
  expect(utilisationBand(0.9999)?.index).toBe(4);
  expect(utilisationBand(1)?.label).toBe('over capacity');
  expect(utilisationBand(7)?.index).toBe(5);
});

test('negative counts as idle; missing or non-finite figures have no band and draw grey', () => {
  expect(utilisationBand(-0.2)?.index).toBe(0);
  for (const missing of [null, undefined, NaN, Infinity]) {
    expect(utilisationBand(missing)).toBeNull();
    expect(utilisationColour(missing)).toBe(mapColors.noFigure);
  }
  expect(formatUtilisation(null)).toBe('—');
  expect(formatUtilisation(0.644)).toBe('64 %');
});

test('bands are contiguous, distinct in colour and take their colours from the theme', () => {
  UTILISATION_BANDS.forEach((band, i) => {
    expect(band.colour).toBe(mapColors.utilisation[i]);
    if (i > 0) expect(band.from).toBe(UTILISATION_BANDS[i - 1].to);
  });
  expect(new Set(UTILISATION_BANDS.map((b) => b.colour)).size).toBe(UTILISATION_BANDS.length);
});

test('property: the band never goes down as utilisation goes up, and contains the figure', () => {
  fc.assert(
    fc.property(fc.double({ min: 0, max: 3, noNaN: true }), fc.double({ min: 0, max: 3, noNaN: true }), (a, b) => {
      const [lo, hi] = a <= b ? [a, b] : [b, a];
      const bandLo = utilisationBand(lo)!;
      return bandLo.index <= utilisationBand(hi)!.index && lo >= bandLo.from && lo < bandLo.to;
    }),
  );
});

test('highlights: nothing dimmed without one; primary wins over secondary; the rest is dimmed', () => {
  const none = emphasisFor(undefined, { sites: [] });
  expect(none.site('a')).toEqual({ dimmed: false, tone: null });
  const e = emphasisFor({ sites: ['a'], spans: ['s1'] }, { sites: ['a', 'b'], spans: ['s2'], tone: 'window' });
  expect(e.site('a')).toEqual({ dimmed: false, tone: 'placement' });
  expect(e.site('b')).toEqual({ dimmed: false, tone: 'window' });
  expect(e.span('s2').tone).toBe('window');
  expect(e.site('c')).toEqual({ dimmed: true, tone: null });
  expect(e.span('s3').dimmed).toBe(true);
  expect(emphasisFor({ spans: ['x'], tone: 'alternative' }).span('x').tone).toBe('alternative');
});
