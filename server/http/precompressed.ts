// Serves the .br / .gz copies that scripts/precompress-web.ts writes next to the exported web app's files.
import fs from 'node:fs';
import path from 'node:path';
import type { RequestHandler, Response } from 'express';

/** Text formats worth compressing; images and fonts in woff2 are compressed already. */
export const COMPRESSIBLE_EXTENSIONS = new Set(['.js', '.mjs', '.css', '.html', '.json', '.map', '.svg', '.txt', '.ttf', '.ico', '.xml']);
/** Below this a compressed copy saves less than one network packet. */
export const MIN_PRECOMPRESS_BYTES = 1024;

const VARIANTS = [
  { coding: 'br', suffix: '.br' },
  { coding: 'gzip', suffix: '.gz' },
] as const;

/** Quality (0 to 1) the client gives each content coding in Accept-Encoding; `*` stands for any coding not listed. */
function acceptedCodings(header: string | undefined): (coding: string) => boolean {
  const q = new Map<string, number>();
  for (const part of (header ?? '').split(',')) {
    const [name, ...params] = part.trim().toLowerCase().split(';');
    if (!name) continue;
    const qParam = params.map((p) => p.trim()).find((p) => p.startsWith('q='));
    const value = qParam === undefined ? 1 : Number(qParam.slice(2));
    q.set(name.trim(), Number.isFinite(value) ? value : 0);
  }
  return (coding) => (q.get(coding) ?? q.get('*') ?? 0) > 0;
}

/**
 * Before express.static: a GET or HEAD for a file with a precompressed copy gets br (first) or gzip when the client
 * accepts it. Ranges are always served from the original file. Every answer for such a file says `Vary: Accept-Encoding`.
 */
export function precompressedAssets({ root, setHeaders }: { root: string; setHeaders: (res: Response, filePath: string) => void }): RequestHandler {
  return (req, res, next) => {
    if (req.method !== 'GET' && req.method !== 'HEAD') return next();
    if (!COMPRESSIBLE_EXTENSIONS.has(path.extname(req.path).toLowerCase())) return next();
    let relative: string;
    try {
      relative = decodeURIComponent(req.path);
    } catch {
      return next();
    }
    if (relative.includes('\0')) return next();
    const filePath = path.join(root, relative);
    if (!filePath.startsWith(root + path.sep)) return next();
    const present = VARIANTS.filter((v) => fs.existsSync(filePath + v.suffix));
    if (present.length === 0 || !fs.existsSync(filePath)) return next();
    res.vary('Accept-Encoding');
    if (req.headers.range) return next();
    const accepts = acceptedCodings(req.headers['accept-encoding']);
    const chosen = present.find((v) => accepts(v.coding));
    if (!chosen) return next();
    res.type(path.extname(filePath));
    res.setHeader('Content-Encoding', chosen.coding);
    setHeaders(res, filePath);
    res.sendFile(filePath + chosen.suffix, { acceptRanges: false, dotfiles: 'deny' }, (err) => {
      if (!err || res.headersSent) return;
      res.removeHeader('Content-Encoding');
      res.removeHeader('Content-Type');
      next();
    });
  };
}
