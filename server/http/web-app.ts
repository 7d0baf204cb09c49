// Serves the exported web app (WEB_DIST) with an SPA fallback, after the API routes.
import fs from 'node:fs';
import path from 'node:path';
import express, { type Response, type Router } from 'express';
import { precompressedAssets } from './precompressed';

/** Expo puts content-hashed bundles here (the entry and every route's chunk): safe to cache for a year. */
const HASHED_ASSETS = `${path.sep}_expo${path.sep}static${path.sep}`;
/** Metro names the files it copies to assets/ (fonts, images) after their content: `name.<32 hex digits>.ext`. */
const CONTENT_HASHED_NAME = /\.[0-9a-f]{32}\.[a-z0-9]+$/i;

export function webApp({ webDist }: { webDist: string }): Router {
  const root = path.resolve(webDist);
  const indexFile = path.join(root, 'index.html');
  const router = express.Router();
  const assetsDir = path.join(root, 'assets') + path.sep;
  const setHeaders = (res: Response, filePath: string) => {
    const hashed = filePath.includes(HASHED_ASSETS) || (filePath.startsWith(assetsDir) && CONTENT_HASHED_NAME.test(filePath));
    if (hashed) res.setHeader('Cache-Control', 'public, max-age=31536000, immutable');
  };
  // The .br / .gz copies written at export (scripts/precompress-web.ts) first, then the files themselves.
  router.use(precompressedAssets({ root, setHeaders }));
  router.use(express.static(root, { index: false, setHeaders }));
  router.get('/{*splat}', (_req, res) => {
    if (!fs.existsSync(indexFile)) {
      res.status(404).json({
        error: { code: 'WEB_APP_MISSING', message: `The web app is not built: ${indexFile} is missing (run npm run export:web).` },
      });
      return;
    }
    // index.html names the current bundles, so it must never be served stale.
    res.setHeader('Cache-Control', 'no-cache');
    res.sendFile(indexFile);
  });
  return router;
}
