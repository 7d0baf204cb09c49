// The preload tags scripts/preload-web.ts adds to the exported index.html: the page's own scripts first, then every
// layout chunk, once, however often the step runs.
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { layoutChunks, withPreloads } from '../../../scripts/preload-web';

const SHELL = [
  '<!DOCTYPE html><html><head><title>Slackwater</title>',
  '  <link rel="icon" href="/favicon.ico" /></head>',
  '<body><div id="root"></div>',
  '<script src="/_expo/static/js/web/__common-aa11.js" defer></script><script src="/_expo/static/js/web/entry-bb22.js" defer></script>',
  '</body></html>',
].join('\n');
const LAYOUTS = ['/_expo/static/js/web/_layout-cc33.js', '/_expo/static/js/web/_layout-dd44.js'];

const preloaded = (html: string) => [...html.matchAll(/<link rel="preload" href="([^"]+)" as="script">/g)].map((m) => m[1]);

test('the page preloads its own scripts in order, then the layout chunks, all inside <head>', () => {
  const html = withPreloads(SHELL, LAYOUTS);
  expect(preloaded(html)).toEqual(['/_expo/static/js/web/__common-aa11.js', '/_expo/static/js/web/entry-bb22.js', ...LAYOUTS]);
  expect(html.lastIndexOf('rel="preload"')).toBeLessThan(html.indexOf('</head>'));
  // The scripts themselves are left as they were.
  expect(html).toContain('<script src="/_expo/static/js/web/entry-bb22.js" defer></script>');
});

test('running the step again replaces its earlier tags instead of adding more', () => {
  const once = withPreloads(SHELL, LAYOUTS);
  expect(withPreloads(once, LAYOUTS)).toBe(once);
  const changed = withPreloads(once, ['/_expo/static/js/web/_layout-ee55.js']);
  expect(preloaded(changed).filter((href) => href.includes('_layout-'))).toEqual(['/_expo/static/js/web/_layout-ee55.js']);
});

test('layout chunks are found among an export\'s chunks by name, as site paths', () => {
  const root = fs.mkdtempSync(path.join(os.tmpdir(), 'slackwater-preload-'));
  try {
    const chunks = path.join(root, '_expo', 'static', 'js', 'web');
    fs.mkdirSync(chunks, { recursive: true });
    for (const name of ['_layout-0f1e.js', '_layout-9a8b.js', 'sign-in-1234.js', '[id]-5678.js', '_layout-0f1e.js.br']) {
      fs.writeFileSync(path.join(chunks, name), '');
    }
    expect(layoutChunks(root)).toEqual(['/_expo/static/js/web/_layout-0f1e.js', '/_expo/static/js/web/_layout-9a8b.js']);
  } finally {
    fs.rmSync(root, { recursive: true, force: true });
  }
});
