import type { RequestHandler } from 'express';
import { AppError } from './errors';

const SAFE = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * Cross-site request forgery guard. Browsers send Origin on cross-site writes, so a foreign Origin is
 * refused; and a write authenticated by the session cookie must also carry a header that a plain
 * cross-site form cannot set. Bearer-token clients are not cookie-driven and need neither.
 */
export function originCheck(): RequestHandler {
  return (req, _res, next) => {
    if (SAFE.has(req.method)) return next();
    const origin = req.get('origin');
    if (origin && origin !== 'null') {
      let host: string | undefined;
      try {
        host = new URL(origin).host;
      } catch {
        host = undefined;
      }
      if (host !== req.get('host')) {
        return next(new AppError('forbidden', 'cross_site_request', 'requests from another site are not accepted'));
      }
    }
    const usesCookie = !req.get('authorization') && Boolean((req.cookies as Record<string, string> | undefined)?.gp_session);
    if (usesCookie && req.get('x-gelpoint-csrf') !== '1') {
      return next(new AppError('forbidden', 'csrf_header_missing', 'send the X-Gelpoint-Csrf: 1 header with every change made through the web session'));
    }
    next();
  };
}
