// The pack's print stylesheet, injected once (react-native-web styles cannot hold @media rules): on paper the app's
// navigation, top bar, skip link and buttons go, the pack prints black on white at full width, table rows are not
// split across pages, and the margins suit both A4 and US Letter.
import { PACK_ROOT_ID } from './pack-root-id';

export const PACK_PRINT_STYLE_ID = 'change-pack-print-style';

export function packPrintCss(): string {
  const pack = `#${PACK_ROOT_ID}`;
  return [
    '@media print {',
    // 15 mm fits inside the printable area of both A4 (210 × 297 mm) and Letter (216 × 279 mm).
    '  @page { margin: 15mm; }',
    // The app's tinted surfaces go white too (browsers often print backgrounds when asked to).
    '  html, body { background: #fff !important; }',
    '  #root, #root * { background-color: transparent !important; }',
    // WARNING: the app's frames are full-height scroll views; on paper they must grow with their content, or only
    // the first screenful prints.
    '  html, body, #root, #root * { height: auto !important; max-height: none !important; overflow: visible !important; }',
    `  [role="navigation"], [role="banner"], [data-testid="skip-link"], ${pack} [role="button"] { display: none !important; }`,
    `  ${pack}, ${pack} * { color: #000 !important; background-color: transparent !important; border-color: #000 !important; box-shadow: none !important; }`,
    `  ${pack} { width: 100% !important; max-width: none !important; padding: 0 !important; }`,
    `  ${pack} [role="row"] { break-inside: avoid; page-break-inside: avoid; }`,
    `  ${pack} [role="heading"] { break-after: avoid; page-break-after: avoid; }`,
    '}',
  ].join('\n');
}

type StyleHost = Pick<Document, 'getElementById' | 'createElement' | 'head'>;

/** Adds the rules once; later calls (a second pack opened, fast refresh) find them and leave them be. */
export function installPackPrintStyle(doc: StyleHost | null = typeof document === 'undefined' ? null : document): void {
  if (!doc || doc.getElementById(PACK_PRINT_STYLE_ID)) return;
  const style = doc.createElement('style');
  style.id = PACK_PRINT_STYLE_ID;
  style.textContent = packPrintCss();
  doc.head.appendChild(style);
}

/** The web prints through the browser's dialog, where "Save as PDF" is one of the printers. */
export const CAN_PRINT = true;

export function printPage(): void {
  if (typeof window !== 'undefined') window.print();
}
