// Writes a brotli (.br) and a gzip (.gz) copy next to each compressible file of the exported web app,
// so server/http/web-app.ts can send the smaller copy without compressing on every request.
// Usage: tsx scripts/precompress-web.ts [dist]   (default dist/). Skips copies that are newer than their source.
import fs from 'node:fs';
import path from 'node:path';
import zlib from 'node:zlib';
import { COMPRESSIBLE_EXTENSIONS, MIN_PRECOMPRESS_BYTES } from '../server/http/precompressed';

function* files(dir: string): Generator<string> {
  for (const entry of fs.readdirSync(dir, { withFileTypes: true })) {
    const full = path.join(dir, entry.name);
    if (entry.isDirectory()) yield* files(full);
    else if (entry.isFile()) yield full;
  }
}

function upToDate(copy: string, sourceMtimeMs: number): boolean {
  return fs.existsSync(copy) && fs.statSync(copy).mtimeMs >= sourceMtimeMs;
}

const root = path.resolve(process.argv[2] ?? 'dist');
let written = 0;
let sourceBytes = 0;
let brBytes = 0;
let gzBytes = 0;
for (const file of files(root)) {
  if (!COMPRESSIBLE_EXTENSIONS.has(path.extname(file).toLowerCase())) continue;
  const stat = fs.statSync(file);
  if (stat.size < MIN_PRECOMPRESS_BYTES) continue;
  const body = fs.readFileSync(file);
  sourceBytes += body.length;
  if (!upToDate(`${file}.br`, stat.mtimeMs)) {
    fs.writeFileSync(
      `${file}.br`,
      zlib.brotliCompressSync(body, {
        params: {
          [zlib.constants.BROTLI_PARAM_QUALITY]: zlib.constants.BROTLI_MAX_QUALITY,
          [zlib.constants.BROTLI_PARAM_SIZE_HINT]: body.length,
          [zlib.constants.BROTLI_PARAM_MODE]: zlib.constants.BROTLI_MODE_TEXT,
        },
      }),
    );
    written += 1;
  }
  if (!upToDate(`${file}.gz`, stat.mtimeMs)) {
    fs.writeFileSync(`${file}.gz`, zlib.gzipSync(body, { level: zlib.constants.Z_BEST_COMPRESSION }));
    written += 1;
  }
  brBytes += fs.statSync(`${file}.br`).size;
  gzBytes += fs.statSync(`${file}.gz`).size;
}
const kb = (bytes: number) => `${(bytes / 1024).toFixed(0)} KB`;
console.log(
  `precompress-web: ${written} copies written; compressible files ${kb(sourceBytes)}, as brotli ${kb(brBytes)}, as gzip ${kb(gzBytes)}`,
);
