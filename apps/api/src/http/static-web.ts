import { existsSync } from 'node:fs';
import { join } from 'node:path';
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

/**
 * Serves the built web app. Hashed assets never change under their name, so they are cached for a
 * year and sent as the .br or .gz twin the build wrote beside them when the client accepts it (Vary:
 * Accept-Encoding). The HTML is revalidated on every visit so a new build is picked up at once; any
 * other non-API GET gets index.html so deep links work.
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
  router.use(express.static(distDir, { index: false, maxAge: '1h' }));
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
