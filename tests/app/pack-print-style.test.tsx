/**
 * @jest-environment jsdom
 */
// The pack's print stylesheet on the web: added once, and on paper it drops the app's frame and buttons.
import { installPackPrintStyle, PACK_PRINT_STYLE_ID, packPrintCss } from '@/components/pack/print-style.web';
import { PACK_ROOT_ID } from '@/components/pack/pack-root-id';

afterEach(() => document.getElementById(PACK_PRINT_STYLE_ID)?.remove());

test('installs one style element, however often it is called', () => {
  installPackPrintStyle(document);
  installPackPrintStyle(document);
  const styles = document.head.querySelectorAll(`style#${PACK_PRINT_STYLE_ID}`);
  expect(styles).toHaveLength(1);
  expect(styles[0].textContent).toBe(packPrintCss());
});

test('the rules apply to print only, hide navigation, skip link and buttons, and keep table rows whole', () => {
  installPackPrintStyle(document);
  const sheet = (document.getElementById(PACK_PRINT_STYLE_ID) as HTMLStyleElement).sheet as CSSStyleSheet;
  expect(sheet.cssRules).toHaveLength(1);
  const media = sheet.cssRules[0] as CSSMediaRule;
  expect(media.media.mediaText).toBe('print');
  const rules = Array.from(media.cssRules).filter((r): r is CSSStyleRule => 'selectorText' in r);
  const hidden = rules.find((r) => r.style.getPropertyValue('display') === 'none');
  expect(hidden?.selectorText).toEqual(expect.stringContaining('[role="navigation"]'));
  expect(hidden?.selectorText).toEqual(expect.stringContaining('[data-testid="skip-link"]'));
  expect(hidden?.selectorText).toEqual(expect.stringContaining(`#${PACK_ROOT_ID} [role="button"]`));
  const ink = rules.find((r) => r.selectorText.startsWith(`#${PACK_ROOT_ID}, `));
  expect(ink?.style.getPropertyValue('color')).toMatch(/^(#000|rgb\(0, 0, 0\))$/);
  const rows = rules.find((r) => r.selectorText === `#${PACK_ROOT_ID} [role="row"]`);
  expect(rows?.style.getPropertyValue('break-inside') || rows?.style.getPropertyValue('page-break-inside')).toBe('avoid');
});
