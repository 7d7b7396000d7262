import { existsSync } from 'node:fs';
import { join } from 'node:path';
import express, { type RequestHandler, type Router } from 'express';

/** Serves the built web app; any other non-API GET gets index.html so deep links work. */
export function staticWeb(distDir: string): Router {
  const router = express.Router();
  const index = join(distDir, 'index.html');
  router.use(
    '/assets',
    express.static(join(distDir, 'assets'), { immutable: true, maxAge: '1y', fallthrough: false, index: false }),
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
