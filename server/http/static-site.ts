import fs from 'node:fs';
import path from 'node:path';
import zlib from 'node:zlib';
import express, { type Express, type Request, type Response } from 'express';
import { compressedAssets } from './compressed-assets';
import { preferredEncoding } from './content-encoding';

/** The app's bundles as the exported page loads them. */
const APP_SCRIPT = /<script src="(\/_expo\/static\/js\/web\/[^"]+\.js)" defer><\/script>/g;

/**
 * A page with a drawing (`ahead` goes before the app's root; the sign-in
 * shell is in the page already): the app's bundles are only named, and
 * public/early-requests.js loads them once the drawing is on screen, so it
 * never waits behind 390 KB of script.
 */
export function withDrawing(html: string, ahead: string): string {
  return html.replace(APP_SCRIPT, '<script type="text/plain" data-app-src="$1"></script>').replace('<div id="root">', `${ahead}<div id="root">`);
}

/** Paths whose page shows the pre-rendered sign-in shell of public/index.html until the app mounts. */
const SHELL_PATHS = new Set(['/sign-in', '/sign-in/']);
const HIDDEN_SHELL = '<div id="boot-shell" hidden>';

/**
 * index.html as sent for a path: on the sign-in page the shell is un-hidden
 * (the CSP forbids an inline script doing it), and, as on every drawn page,
 * the app loads once it is painted.
 */
export function pageHtml(html: string, pagePath: string): string {
  return SHELL_PATHS.has(pagePath) ? withDrawing(html.replace(HIDDEN_SHELL, '<div id="boot-shell">'), '') : html;
}

/** Whether a file of dist/ (path relative to it) has a name that never changes content: cached for a year. */
export function isImmutableAsset(relativePath: string): boolean {
  // _expo/static and assets/ names carry the build's content hash; public/fonts/ names carry one by hand (public/fonts/README.md).
  const top = relativePath.split(/[\\/]/)[0];
  return top === '_expo' || top === 'assets' || top === 'fonts';
}

/**
 * Serves the exported web app from dist/ with a single-page fallback.
 * Hashed bundles and fonts are cached for a year; index.html is always revalidated.
 * The fallback never answers /api paths (those get JSON 404s).
 */
export function mountStaticSite(app: Express, distDir: string, drawnAhead?: (req: Request, res: Response) => Promise<string>) {
  const indexFile = path.join(distDir, 'index.html');
  // Hashed bundles and fonts go out Brotli- or gzip-compressed; the rest (and old browsers) fall through.
  app.use(compressedAssets(distDir));
  app.use(
    express.static(distDir, {
      index: false,
      setHeaders(res, file) {
        if (isImmutableAsset(path.relative(distDir, file))) {
          res.setHeader('Cache-Control', 'public, max-age=31536000, immutable');
        }
      },
    }),
  );
  app.get('/{*splat}', (req, res, next) => {
    if (req.path === '/api' || req.path.startsWith('/api/')) return next();
    fs.readFile(indexFile, 'utf8', async (err, html) => {
      if (err) {
        res.status(503).type('text/plain').send('The web app has not been built yet. Run `npm start`, which builds it.');
        return;
      }
      // A page drawn for this person (a walk's step) is theirs alone: never stored. Failing to draw it is no error.
      const ahead = drawnAhead ? await drawnAhead(req, res).catch(() => '') : '';
      if (ahead) html = withDrawing(html, ahead);
      res.setHeader('Cache-Control', ahead ? 'private, no-store' : 'no-cache');
      res.setHeader('Vary', 'Accept-Encoding');
      res.type('html');
      // The page (about 7 KB with the shell's styles) is the first thing a phone waits for: compress it too.
      const body = Buffer.from(pageHtml(html, req.path));
      const encoding = preferredEncoding(req);
      if (!encoding) return void res.send(body);
      res.setHeader('Content-Encoding', encoding);
      res.send(encoding === 'br' ? zlib.brotliCompressSync(body) : zlib.gzipSync(body));
    });
  });
}
