// The palette's contrast: every declared pair reaches its minimum, and every colour/background pair written on one
// style line in the app is among the declared ones.
import { readdirSync, readFileSync } from 'fs';
import { join } from 'path';
// Ratios from a published implementation of WCAG 2.x relative luminance and contrast ratio, not a formula of ours.
import { hex as contrastRatio } from 'wcag-contrast';
import { contrastPairs, NON_TEXT_RATIO, TEXT_RATIO } from '@/constants/contrast-pairs';
import { calendarColors, colors } from '@/constants/theme';

const ROOT = join(__dirname, '..', '..');

describe('declared pairs', () => {
  // Minimums from WCAG 2.1 SC 1.4.3 Contrast (Minimum): 4.5:1 for text, and SC 1.4.11 Non-text Contrast:
  // 3:1 for user-interface components and graphical objects.
  test.each(contrastPairs.map((pair) => [pair.use, pair] as const))('%s reaches its minimum', (_use, pair) => {
    expect(contrastRatio(pair.fg, pair.bg)).toBeGreaterThanOrEqual(pair.minRatio);
  });

  test('the check itself fails the colours the audit found too faint', () => {
    // Captions were #7F97A0 on white and on tide, days outside the month #A9BABF on white.
    expect(contrastRatio('#7F97A0', colors.surface)).toBeLessThan(TEXT_RATIO);
    expect(contrastRatio('#7F97A0', colors.tide)).toBeLessThan(TEXT_RATIO);
    expect(contrastRatio('#A9BABF', colors.surface)).toBeLessThan(TEXT_RATIO);
    // Card lines are decoration: they stay light, so text inputs draw their edge in borderControl instead.
    expect(contrastRatio(colors.border, colors.surface)).toBeLessThan(NON_TEXT_RATIO);
  });

  test('faint text is still lighter than muted text, so captions keep their place below the body', () => {
    expect(contrastRatio(colors.inkFaint, colors.surface)).toBeLessThan(contrastRatio(colors.inkMuted, colors.surface));
    expect(contrastRatio(calendarColors.outsideMonth, colors.surface)).toBeLessThan(contrastRatio(colors.ink, colors.surface));
  });
});

/** Source spelling of each theme colour token (`colors.ink`, `calendarColors.status.planned`) → its value. */
function tokenValues(): Map<string, string> {
  const map = new Map<string, string>();
  for (const [name, value] of Object.entries(colors)) map.set(`colors.${name}`, value);
  for (const [name, value] of Object.entries(calendarColors)) {
    if (typeof value === 'string') map.set(`calendarColors.${name}`, value);
    else for (const [status, tone] of Object.entries(value)) map.set(`calendarColors.status.${status}`, tone);
  }
  return map;
}

function sourceFiles(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((entry) => {
    const path = join(dir, entry.name);
    if (entry.isDirectory()) return sourceFiles(path);
    return /\.tsx?$/.test(entry.name) ? [path] : [];
  });
}

const TOKEN = String.raw`((?:colors|calendarColors)\.[\w.]+)`;
const FG = new RegExp(String.raw`(?<![\w])color: ${TOKEN}`);
const BG = new RegExp(String.raw`backgroundColor: ${TOKEN}`);

test('every colour and background written together on one style line is a declared pair', () => {
  const values = tokenValues();
  const declared = new Set(contrastPairs.map((pair) => `${pair.fg}|${pair.bg}`));
  const found: string[] = [];
  const missing: string[] = [];
  for (const file of [...sourceFiles(join(ROOT, 'components')), ...sourceFiles(join(ROOT, 'app'))]) {
    readFileSync(file, 'utf8').split('\n').forEach((line, index) => {
      const fg = FG.exec(line)?.[1];
      const bg = BG.exec(line)?.[1];
      if (!fg || !bg) return;
      const where = `${file.slice(ROOT.length + 1)}:${index + 1} ${fg} on ${bg}`;
      found.push(where);
      const fgValue = values.get(fg);
      const bgValue = values.get(bg);
      if (!fgValue || !bgValue || !declared.has(`${fgValue}|${bgValue}`)) missing.push(where);
    });
  }
  // The scan must see the pills and badges it is meant to guard, or it proves nothing.
  expect(found.length).toBeGreaterThan(10);
  expect(missing).toEqual([]);
});
