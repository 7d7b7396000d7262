import express, { type ErrorRequestHandler, type Request, type Response } from 'express';
import { renderInboxPage, renderMessagePage, type SmtpEndpoint } from './page';
import { isAddressedTo } from './sink-message';
import type { MessageStore } from './store';

// The page loads nothing from anywhere; a received mail's HTML only ever runs inside the sandboxed srcdoc frame.
const PAGE_POLICY = "default-src 'none'; style-src 'unsafe-inline'; img-src data:; form-action 'self'; base-uri 'none'";

type ErrorBody = { error: { code: string; message: string } };

function sendError(res: Response, status: number, code: string, message: string): void {
  const body: ErrorBody = { error: { code, message } };
  res.status(status).json(body);
}

type FilterResult = { ok: true; recipient: string } | { ok: false; message: string };

function recipientFilter(req: Request): FilterResult {
  const value: unknown = req.query.to;
  if (value === undefined) return { ok: true, recipient: '' };
  if (typeof value === 'string') return { ok: true, recipient: value.trim() };
  return { ok: false, message: 'The "to" filter takes one address; pass ?to=someone@example.com once.' };
}

export function createHttpApp(store: MessageStore, smtp: SmtpEndpoint): express.Express {
  const app = express();
  app.disable('x-powered-by');
  app.set('etag', false);

  app.use((_req, res, next) => {
    res.set('Cache-Control', 'no-store');
    res.set('X-Content-Type-Options', 'nosniff');
    next();
  });

  const matching = (recipient: string) => (recipient === '' ? store.list() : store.list().filter((message) => isAddressedTo(message, recipient)));

  app.get('/api/messages', (req, res) => {
    const filter = recipientFilter(req);
    if (!filter.ok) return sendError(res, 400, 'INVALID_FILTER', filter.message);
    res.json(matching(filter.recipient));
  });

  app.get('/api/messages/:id', (req, res) => {
    const message = store.find(req.params.id);
    if (!message) {
      return sendError(res, 404, 'MESSAGE_NOT_FOUND', `No message has the id "${req.params.id}"; list /api/messages for the ids the sink holds.`);
    }
    res.json(message);
  });

  app.delete('/api/messages', async (_req, res) => {
    await store.clear();
    res.status(204).end();
  });

  const sendPage = (res: Response, html: string) => {
    res.set('Content-Security-Policy', PAGE_POLICY);
    res.type('html').send(html);
  };

  app.get('/', (req, res) => {
    const filter = recipientFilter(req);
    if (!filter.ok) return sendError(res, 400, 'INVALID_FILTER', filter.message);
    sendPage(res, renderInboxPage(matching(filter.recipient), smtp, filter.recipient));
  });

  app.get('/messages/:id', (req, res) => {
    const message = store.find(req.params.id);
    if (!message) {
      return sendError(res, 404, 'MESSAGE_NOT_FOUND', `No message has the id "${req.params.id}"; go back to / for the list.`);
    }
    sendPage(res, renderMessagePage(message, smtp));
  });

  app.use((req, res) => {
    sendError(res, 404, 'NOT_FOUND', `Nothing at ${req.method} ${req.path}; the sink serves /, /api/messages and /api/messages/:id.`);
  });

  const onError: ErrorRequestHandler = (error: unknown, _req, res, _next) => {
    const reason = error instanceof Error ? error.message : String(error);
    sendError(res, 500, 'SINK_FAILED', `The mail sink failed to answer (${reason}); check its data folder and try again.`);
  };
  app.use(onError);

  return app;
}
