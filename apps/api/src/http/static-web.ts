import { existsSync } from 'node:fs';
import { basename, join } from 'node:path';
import type { ServerResponse } from 'node:http';
import express, { type RequestHandler, type Router } from 'express';
import expressStaticGzip from 'express-static-gzip';
import { AppError } from './errors';

// express-static-gzip decodes the path itself and answers a broken %-escape with a bare text 400;
// refusing it first keeps the API's own sentence (errors.ts maps a 400 URIError to bad_path).
const refuseBrokenEscapes: RequestHandler = (req, _res, next) => {
  try {
    decodeURIComponent(req.path);
  } catch {
    return next(Object.assign(new URIError('broken %-escape in the path'), { status: 400 }));
  }
  next();
};

// A missing or refused asset (a climb out of /assets included) is a 404 here, never the app's HTML.
const noSuchAsset: RequestHandler = (_req, _res, next) => next(new AppError('not_found', 'not_found', 'there is nothing to serve at this address'));

// The service worker and the manifest keep their names across builds, so a browser must ask again each time
// (the Service Workers spec has the browser check the worker script at least daily whatever it is told; no-cache
// makes every check reach us). The worker's runtime helper carries a content hash and never changes.
const revalidated = new Set(['sw.js', 'manifest.webmanifest']);
const hashedRuntime = /^workbox-[0-9a-f]{8}\.js$/;

function appFileHeaders(res: ServerResponse, path: string): void {
  const name = basename(path);
  if (revalidated.has(name)) res.setHeader('Cache-Control', 'no-cache');
  else if (hashedRuntime.test(name)) res.setHeader('Cache-Control', 'public, max-age=31536000, immutable');
  if (name === 'manifest.webmanifest') res.setHeader('Content-Type', 'application/manifest+json; charset=utf-8');
}

/**
 * Serves the built web app. Hashed assets never change under their name, so they are cached for a
 * year and sent as the .br or .gz twin the build wrote beside them when the client accepts it (Vary:
 * Accept-Encoding). The HTML, the service worker and the manifest are revalidated on every visit so a new
 * build is picked up at once; every other non-API GET gets index.html so deep links work.
 */
export function staticWeb(distDir: string): Router {
  const router = express.Router();
  const index = join(distDir, 'index.html');
  router.use(
    '/assets',
    refuseBrokenEscapes,
    expressStaticGzip(join(distDir, 'assets'), {
      enableBrotli: true,
      orderPreference: ['br', 'gzip'],
      index: false,
      serveStatic: { immutable: true, maxAge: '1y', index: false },
    }),
    noSuchAsset,
  );
  router.use(express.static(distDir, { index: false, maxAge: '1h', setHeaders: appFileHeaders }));
  const spa: RequestHandler = (req, res, next) => {
    if (req.method !== 'GET' && req.method !== 'HEAD') return next();
    if (!existsSync(index)) {
      res.status(404).type('text/plain').send('The web app is not built yet: run npm start (or npm run build).');
      return;
    }
    res.setHeader('Cache-Control', 'no-cache');
    res.sendFile(index);
  };
  router.use(spa);
  return router;
}
