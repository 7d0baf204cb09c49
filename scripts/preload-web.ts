// Adds <link rel="preload"> tags to the exported web app's index.html so a first load fetches at once what it
// would otherwise ask for only after its scripts have run, a round trip or more later on a slow link: the page's own
// scripts first (deferred, the browser would queue them behind the rest), then the route layouts' chunks (Expo Router
// loads every one at start), then the Work Sans files (the root layout shows no screen before they are in).
// Usage: tsx scripts/preload-web.ts [dist]   (default dist/). Run again, it replaces its own earlier tags.
import fs from 'node:fs';
import path from 'node:path';

const START = '<!-- preload-web: start -->';
const END = '<!-- preload-web: end -->';
const CHUNKS = '_expo/static/js/web';
const ASSETS = 'assets';

function* files(dir: string): Generator<string> {
  if (!fs.existsSync(dir)) return;
  for (const entry of fs.readdirSync(dir, { withFileTypes: true })) {
    const full = path.join(dir, entry.name);
    if (entry.isDirectory()) yield* files(full);
    else if (entry.isFile()) yield full;
  }
}

const sitePath = (root: string, file: string) => `/${path.relative(root, file).split(path.sep).join('/')}`;

/** Site paths ('/…') of an export's layout chunks and font files, each sorted so the output is stable. */
export function preloadTargets(root: string): { layouts: string[]; fonts: string[] } {
  const layouts = [...files(path.join(root, CHUNKS))].filter((f) => /^_layout-[0-9a-f]+\.js$/.test(path.basename(f)));
  const fonts = [...files(path.join(root, ASSETS))].filter((f) => f.endsWith('.ttf'));
  return { layouts: layouts.map((f) => sitePath(root, f)).sort(), fonts: fonts.map((f) => sitePath(root, f)).sort() };
}

/** index.html with one block of preload tags just before </head>, replacing a block written earlier. */
export function withPreloads(html: string, targets: { layouts: string[]; fonts: string[] }): string {
  // The block ends in the line break written below, and the page's own whitespace stays before it.
  const cleaned = html.replace(new RegExp(`${START}[\\s\\S]*?${END}\\s*`), '');
  const named = [...cleaned.matchAll(/<script src="([^"]+)"/g)].map((match) => match[1]);
  const tags = [
    ...[...new Set([...named, ...targets.layouts])].map((href) => `<link rel="preload" href="${href}" as="script">`),
    // Fonts are always fetched in CORS mode; without crossorigin the preload would not be reused.
    ...targets.fonts.map((href) => `<link rel="preload" href="${href}" as="font" type="font/ttf" crossorigin>`),
  ];
  if (tags.length === 0) return cleaned;
  const block = `${START}\n    ${tags.join('\n    ')}\n    ${END}\n  `;
  if (!cleaned.includes('</head>')) throw new Error('index.html has no </head>');
  return cleaned.replace('</head>', `${block}</head>`);
}

function main() {
  const root = path.resolve(process.argv[2] ?? 'dist');
  const indexFile = path.join(root, 'index.html');
  const targets = preloadTargets(root);
  const before = fs.readFileSync(indexFile, 'utf8');
  const after = withPreloads(before, targets);
  if (after !== before) fs.writeFileSync(indexFile, after);
  console.log(`preload-web: index.html preloads its scripts, ${targets.layouts.length} layout chunks and ${targets.fonts.length} font files`);
}

if (require.main === module) main();
