// Adds <link rel="preload"> tags to the exported web app's index.html: first the scripts index.html itself names
// (deferred, the browser would queue them behind anything else), then the route layouts' chunks, which Expo Router
// loads on every first load but only once those scripts have run. Fetched alongside them, the layouts no longer
// cost a round trip of their own on a slow link.
// Fonts are left out on purpose: Chromium fetched one Work Sans file twice when preloaded (expo-font asks for it
// through the FontFace API and a stylesheet), which costs more than the round trip it saves.
// Usage: tsx scripts/preload-web.ts [dist]   (default dist/). Run again, it replaces its own earlier tags.
import fs from 'node:fs';
import path from 'node:path';

const START = '<!-- preload-web: start -->';
const END = '<!-- preload-web: end -->';
const CHUNKS = '_expo/static/js/web';

function* files(dir: string): Generator<string> {
  if (!fs.existsSync(dir)) return;
  for (const entry of fs.readdirSync(dir, { withFileTypes: true })) {
    const full = path.join(dir, entry.name);
    if (entry.isDirectory()) yield* files(full);
    else if (entry.isFile()) yield full;
  }
}

/** Site paths ('/…') of an export's layout chunks, sorted so the output is stable. */
export function layoutChunks(root: string): string[] {
  const sitePath = (file: string) => `/${path.relative(root, file).split(path.sep).join('/')}`;
  return [...files(path.join(root, CHUNKS))].filter((f) => /^_layout-[0-9a-f]+\.js$/.test(path.basename(f))).map(sitePath).sort();
}

/** index.html with one block of preload tags just before </head> (its own scripts, then `layouts`), replacing a block written earlier. */
export function withPreloads(html: string, layouts: string[]): string {
  // The block ends in the line break written below, and the page's own whitespace stays before it.
  const cleaned = html.replace(new RegExp(`${START}[\\s\\S]*?${END}\\s*`), '');
  const named = [...cleaned.matchAll(/<script src="([^"]+)"/g)].map((match) => match[1]);
  const tags = [...new Set([...named, ...layouts])].map((href) => `<link rel="preload" href="${href}" as="script">`);
  if (tags.length === 0) return cleaned;
  const block = `${START}\n    ${tags.join('\n    ')}\n    ${END}\n  `;
  if (!cleaned.includes('</head>')) throw new Error('index.html has no </head>');
  return cleaned.replace('</head>', `${block}</head>`);
}

function main() {
  const root = path.resolve(process.argv[2] ?? 'dist');
  const indexFile = path.join(root, 'index.html');
  const layouts = layoutChunks(root);
  const before = fs.readFileSync(indexFile, 'utf8');
  const after = withPreloads(before, layouts);
  if (after !== before) fs.writeFileSync(indexFile, after);
  console.log(`preload-web: index.html preloads its scripts and ${layouts.length} layout chunks`);
}

if (require.main === module) main();
