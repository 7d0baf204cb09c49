// The preload tags scripts/preload-web.ts adds to the exported index.html: the page's own scripts first, then every
// layout chunk, then the font files, once each, however often the step runs.
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { preloadTargets, withPreloads } from '../../../scripts/preload-web';

const SHELL = [
  '<!DOCTYPE html><html><head><title>Slackwater</title>',
  '  <link rel="icon" href="/favicon.ico" /></head>',
  '<body><div id="root"></div>',
  '<script src="/_expo/static/js/web/__common-aa11.js" defer></script><script src="/_expo/static/js/web/entry-bb22.js" defer></script>',
  '</body></html>',
].join('\n');
const LAYOUTS = ['/_expo/static/js/web/_layout-cc33.js', '/_expo/static/js/web/_layout-dd44.js'];
const FONTS = ['/assets/fonts/Face_400Regular.0123456789abcdef0123456789abcdef.ttf'];
const TARGETS = { layouts: LAYOUTS, fonts: FONTS };

const preloaded = (html: string) => [...html.matchAll(/<link rel="preload" href="([^"]+)" as="(script|font)"/g)].map((m) => m[1]);

test('the page preloads its own scripts in order, then the layout chunks, then the fonts, all inside <head>', () => {
  const html = withPreloads(SHELL, TARGETS);
  expect(preloaded(html)).toEqual(['/_expo/static/js/web/__common-aa11.js', '/_expo/static/js/web/entry-bb22.js', ...LAYOUTS, ...FONTS]);
  // A font preload without crossorigin would be fetched again by the font loader.
  expect(html).toContain(`<link rel="preload" href="${FONTS[0]}" as="font" type="font/ttf" crossorigin>`);
  expect(html.lastIndexOf('rel="preload"')).toBeLessThan(html.indexOf('</head>'));
  // The scripts themselves are left as they were.
  expect(html).toContain('<script src="/_expo/static/js/web/entry-bb22.js" defer></script>');
});

test('running the step again replaces its earlier tags instead of adding more', () => {
  const once = withPreloads(SHELL, TARGETS);
  expect(withPreloads(once, TARGETS)).toBe(once);
  const changed = withPreloads(once, { layouts: ['/_expo/static/js/web/_layout-ee55.js'], fonts: [] });
  expect(preloaded(changed).filter((href) => href.includes('_layout-'))).toEqual(['/_expo/static/js/web/_layout-ee55.js']);
});

test('layout chunks are found among an export\'s chunks by name, and fonts among its assets, as site paths', () => {
  const root = fs.mkdtempSync(path.join(os.tmpdir(), 'slackwater-preload-'));
  try {
    const chunks = path.join(root, '_expo', 'static', 'js', 'web');
    fs.mkdirSync(chunks, { recursive: true });
    for (const name of ['_layout-0f1e.js', '_layout-9a8b.js', 'sign-in-1234.js', '[id]-5678.js', '_layout-0f1e.js.br']) {
      fs.writeFileSync(path.join(chunks, name), '');
    }
    const fonts = path.join(root, 'assets', 'node_modules', 'face');
    fs.mkdirSync(fonts, { recursive: true });
    for (const name of ['Face_700Bold.ab.ttf', 'Face_700Bold.ab.ttf.br', 'icon.cd.png']) fs.writeFileSync(path.join(fonts, name), '');
    expect(preloadTargets(root)).toEqual({
      layouts: ['/_expo/static/js/web/_layout-0f1e.js', '/_expo/static/js/web/_layout-9a8b.js'],
      fonts: ['/assets/node_modules/face/Face_700Bold.ab.ttf'],
    });
  } finally {
    fs.rmSync(root, { recursive: true, force: true });
  }
});
