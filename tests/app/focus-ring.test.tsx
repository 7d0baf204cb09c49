/**
 * @jest-environment jsdom
 */
// The web focus ring: one global :focus-visible rule, added once, in two bands of which one always contrasts.
import { hex as contrastRatio } from 'wcag-contrast';
import { NON_TEXT_RATIO } from '@/constants/contrast-pairs';
import { colors } from '@/constants/theme';
import { FOCUS_RING_STYLE_ID, focusRingCss, installFocusRing } from '@/components/focus-ring.web';

afterEach(() => {
  document.getElementById(FOCUS_RING_STYLE_ID)?.remove();
});

test('installs one style element with the :focus-visible rule, however often it is called', () => {
  installFocusRing(document);
  installFocusRing(document);
  const styles = document.head.querySelectorAll(`style#${FOCUS_RING_STYLE_ID}`);
  expect(styles).toHaveLength(1);
  expect(styles[0].textContent).toBe(focusRingCss());
});

test('the rule parses as a dark outline outside a light halo of the same width', () => {
  installFocusRing(document);
  const sheet = (document.getElementById(FOCUS_RING_STYLE_ID) as HTMLStyleElement).sheet as CSSStyleSheet;
  const rule = sheet.cssRules[0] as CSSStyleRule;
  expect(rule.selectorText).toBe(':focus-visible');
  expect(rule.style.getPropertyValue('outline')).toContain('solid');
  expect(rule.style.getPropertyPriority('outline')).toBe('important');
  expect(rule.style.getPropertyValue('outline-offset')).toBe('2px');
  expect(rule.style.getPropertyValue('outline')).toContain(colors.focusRing);
  expect(rule.style.getPropertyValue('box-shadow')).toBe(`0 0 0 2px ${colors.focusHalo}`);
  expect(rule.style.getPropertyPriority('box-shadow')).toBe('important');
});

test('without a document (server rendering, native) nothing is installed and nothing throws', () => {
  expect(() => installFocusRing(null)).not.toThrow();
  expect(document.getElementById(FOCUS_RING_STYLE_ID)).toBeNull();
});

// WCAG 2.1 SC 1.4.11 Non-text Contrast (3:1) for the focus indicator, computed with wcag-contrast.
test.each([
  ['white card', colors.surface],
  ['tide page', colors.tide],
  ['sunken well', colors.surfaceSunken],
  ['selected row', colors.primarySoft],
  ['abyss side rail', colors.abyss],
  ['primary button', colors.primary],
  ['pressed primary button', colors.primaryPressed],
  ['danger button', colors.danger],
])('on a %s one band of the ring reaches 3:1', (_surface, background) => {
  const best = Math.max(contrastRatio(colors.focusRing, background), contrastRatio(colors.focusHalo, background));
  expect(best).toBeGreaterThanOrEqual(NON_TEXT_RATIO);
});

test('the two bands contrast with each other, so the ring reads as a ring wherever it lands', () => {
  expect(contrastRatio(colors.focusRing, colors.focusHalo)).toBeGreaterThanOrEqual(NON_TEXT_RATIO);
});
