import type { Request, Response } from 'express';
import type { DataSource } from 'typeorm';
import type { MoldProgressEvent } from '@gelpoint/contracts';
import { notFound } from '../../http/errors';
import type { MoldProgressHub, ProgressNote } from './mold-progress-hub';

/** How long a browser waits before reconnecting a stream that dropped (the EventSource `retry` field, ms). */
const RECONNECT_MS = 3000;

const eventName = (status: MoldProgressEvent['status']) => (status === 'ready' ? 'ready' : status === 'failed' ? 'failed' : 'progress');

/**
 * Streams a mould's analysis as Server-Sent Events (HTML Living Standard, "Server-sent events"): its state now as a
 * first `progress` event (or the last one), then every change the database announces, and a final `ready` or
 * `failed` event, after which the stream closes. Comments keep a quiet stream open.
 */
export async function streamMoldEvents(
  ds: DataSource,
  hub: MoldProgressHub,
  heartbeatMs: number,
  where: { shopId: string; moldId: string },
  req: Request,
  res: Response,
): Promise<void> {
  // Listening starts before the state is read, so no change falls between the two.
  let emit: ((n: ProgressNote | 'lost') => void) | undefined;
  const early: (ProgressNote | 'lost')[] = [];
  const stop = await hub.follow(where.moldId, (n) => (emit ? emit(n) : early.push(n)));
  let rows: { status: MoldProgressEvent['status']; progress: number; error_code: string | null; error_message: string | null }[];
  try {
    rows = await ds.query('SELECT status, progress, error_code, error_message FROM molds WHERE id = $1 AND shop_id = $2', [where.moldId, where.shopId]);
  } catch (err) {
    stop();
    throw err;
  }
  const row = rows[0];
  if (!row) {
    stop();
    throw notFound('mould');
  }

  res.status(200);
  res.setHeader('Content-Type', 'text/event-stream; charset=utf-8');
  res.setHeader('Cache-Control', 'no-store');
  // A reverse proxy that buffers answers (nginx does by default) would hold the events back.
  res.setHeader('X-Accel-Buffering', 'no');
  res.flushHeaders();

  let ended = false;
  const heartbeat = setInterval(() => res.write(': still here\n\n'), heartbeatMs);
  const finish = () => {
    if (ended) return;
    ended = true;
    clearInterval(heartbeat);
    stop();
    res.end();
  };
  req.on('close', finish);
  let last = '';
  const send = (e: MoldProgressEvent) => {
    const data = JSON.stringify(e);
    // The first state read and an announcement of the same change can both arrive: each state goes once.
    if (data === last) return;
    last = data;
    const name = eventName(e.status);
    res.write(`event: ${name}\ndata: ${data}\n\n`);
    if (name !== 'progress') finish();
  };
  emit = (n) => {
    if (ended) return;
    if (n === 'lost') return finish();
    send({ status: n.status, progress: n.progress, error: n.error });
  };
  res.write(`retry: ${RECONNECT_MS}\n\n`);
  send({ status: row.status, progress: row.progress, error: row.error_code ? { code: row.error_code, message: row.error_message ?? '' } : null });
  for (const n of early) emit(n);
}
