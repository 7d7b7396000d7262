import compression from 'compression';

/**
 * Answers above 1 kB go out compressed when the client accepts it (lists, reports, the OpenAPI
 * document). A Server-Sent Events stream is never held back for compression, and bodies that are
 * already compressed (photos) are left alone by the middleware's own type check.
 */
export function compressAnswers() {
  return compression({
    threshold: 1024,
    filter: (req, res) => !String(res.getHeader('Content-Type') ?? '').startsWith('text/event-stream') && compression.filter(req, res),
  });
}
