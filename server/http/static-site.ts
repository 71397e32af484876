import fs from 'node:fs';
import path from 'node:path';
import express, { type Express } from 'express';
import { compressedAssets } from './compressed-assets';

/**
 * Serves the exported web app from dist/ with a single-page fallback.
 * Hashed bundles are cached for a year; index.html is always revalidated.
 * The fallback never answers /api paths (those get JSON 404s).
 */
export function mountStaticSite(app: Express, distDir: string) {
  const indexFile = path.join(distDir, 'index.html');
  // Hashed bundles and fonts go out Brotli- or gzip-compressed; the rest (and old browsers) fall through.
  app.use(compressedAssets(distDir));
  app.use(
    express.static(distDir, {
      index: false,
      setHeaders(res, file) {
        if (file.includes(`${path.sep}_expo${path.sep}static${path.sep}`) || file.includes(`${path.sep}assets${path.sep}`)) {
          res.setHeader('Cache-Control', 'public, max-age=31536000, immutable');
        }
      },
    }),
  );
  app.get('/{*splat}', (req, res, next) => {
    if (req.path === '/api' || req.path.startsWith('/api/')) return next();
    if (!fs.existsSync(indexFile)) {
      res.status(503).type('text/plain').send('The web app has not been built yet. Run `npm start`, which builds it.');
      return;
    }
    res.setHeader('Cache-Control', 'no-cache');
    res.sendFile(indexFile);
  });
}
