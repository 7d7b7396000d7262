import type { Worker } from 'node:worker_threads';
import { storeMoldAnalysis, storeMoldRefusal } from '@gelpoint/db';
import { cavityAnalysisVersion } from '@gelpoint/mesh';
import { tsWorker } from '../ts-worker';
import type { Logger } from 'pino';
import type { DataSource } from 'typeorm';
import type { AnalysisMessage, AnalysisRequest } from './mold-analysis.thread';
import { readMoldFileBytes } from './mold-file-bytes';

export interface MoldAnalysisSettings {
  maxTriangles: number;
  /** The most a 3MF's model part may unpack to. */
  maxUnpackedBytes: number;
  /** How long a claim holds; a worker that dies mid-analysis frees the mould after this. */
  leaseS: number;
  maxAttempts: number;
}

interface ClaimedMold {
  id: string;
  units: AnalysisRequest['units'];
  up_axis: AnalysisRequest['up'];
  attempts: number;
}

export async function claimQueuedMold(ds: DataSource, s: MoldAnalysisSettings): Promise<ClaimedMold | undefined> {
  const rows: ClaimedMold[] = await ds.query(
    `WITH claimed AS (
       UPDATE molds m SET status = 'analysing', attempts = m.attempts + 1, progress = 0.05,
              locked_until = now() + make_interval(secs => $1), updated_at = now()
        WHERE m.id = (
          SELECT id FROM molds
           WHERE status = 'queued' OR (status = 'analysing' AND locked_until < now())
           ORDER BY created_at
           LIMIT 1
           FOR UPDATE SKIP LOCKED)
       RETURNING m.id, m.units, m.up_axis, m.attempts)
     SELECT * FROM claimed`,
    [s.leaseS],
  );
  return rows[0];
}

/** The analysis was cut short because the worker is stopping; the mould goes back to the queue. */
class AnalysisStopped extends Error {}

/** A started analysis thread, and what ended it if it ended before it was given its work. */
interface AnalysisThread {
  worker: Worker;
  failed?: Error;
}

function spawnAnalysisThread(): AnalysisThread {
  const worker = tsWorker(new URL('./mold-analysis.thread.ts', import.meta.url), { resourceLimits: { maxOldGenerationSizeMb: 4096 } });
  const thread: AnalysisThread = { worker };
  worker.on('error', (err) => (thread.failed ??= err));
  worker.once('exit', (code) => (thread.failed ??= new Error(`the analysis thread stopped (exit ${code})`)));
  return thread;
}

function runThread(
  thread: AnalysisThread,
  req: AnalysisRequest,
  onProgress: (v: number) => void,
  stop?: AbortSignal,
): Promise<Extract<AnalysisMessage, { type: 'done' | 'refused' }>> {
  const w = thread.worker;
  return new Promise((resolve, reject) => {
    if (thread.failed) return reject(thread.failed);
    if (stop?.aborted) {
      void w.terminate();
      return reject(new AnalysisStopped('the worker is stopping'));
    }
    let settled = false;
    const onStop = () => {
      if (settled) return;
      settled = true;
      reject(new AnalysisStopped('the worker is stopping'));
      void w.terminate();
    };
    // One listener per analysis on the worker's long-lived signal, so it goes when the analysis does.
    const settle = () => {
      settled = true;
      stop?.removeEventListener('abort', onStop);
    };
    stop?.addEventListener('abort', onStop, { once: true });
    w.on('message', (m: AnalysisMessage) => {
      if (m.type === 'progress') return onProgress(m.value);
      settle();
      resolve(m);
      void w.terminate();
    });
    w.on('error', (err) => {
      settle();
      reject(err);
    });
    w.on('exit', (code) => {
      if (settled) return;
      settle();
      reject(new Error(`the analysis thread stopped (exit ${code})`));
    });
    w.postMessage(req, [req.bytes.buffer as ArrayBuffer]);
  });
}

/** Analyses one queued mould, if any; returns whether it found one. */
export async function analyseNextMold(ds: DataSource, s: MoldAnalysisSettings, logger: Logger, stop?: AbortSignal): Promise<boolean> {
  const mold = await claimQueuedMold(ds, s);
  if (!mold) return false;
  const log = logger.child({ moldId: mold.id });
  try {
    // The thread starts (and loads the engine) while the file is read.
    const thread = spawnAnalysisThread();
    let bytes: Uint8Array | null;
    try {
      bytes = await readMoldFileBytes(ds, mold.id);
      if (!bytes) throw new Error('the mould file bytes are missing');
      await ds.query('UPDATE molds SET progress = 0.15 WHERE id = $1', [mold.id]);
    } catch (err) {
      void thread.worker.terminate();
      throw err;
    }
    const outcome = await runThread(
      thread,
      { bytes, units: mold.units, up: mold.up_axis, maxTriangles: s.maxTriangles, maxUnpackedBytes: s.maxUnpackedBytes },
      (value) => {
        // Sent without waiting, so two may reach the database out of order on different connections: progress only
        // ever rises, and a late, lower one changes nothing (and announces nothing).
        void ds.query(`UPDATE molds SET progress = $2 WHERE id = $1 AND status = 'analysing' AND progress < $2`, [mold.id, value]).catch(() => undefined);
      },
      stop,
    );
    // Units or up axis corrected while this ran: the mould is queued again and this outcome is of the old reading,
    // so both stores below change nothing then.
    const reading = { units: mold.units, up: mold.up_axis };
    if (outcome.type === 'refused') {
      await storeMoldRefusal(ds, mold.id, reading, outcome);
      log.info({ code: outcome.code }, 'mould refused by the engine');
      return true;
    }
    await storeMoldAnalysis(ds, mold.id, { ...outcome, ...reading });
    log.info('mould analysed');
  } catch (err) {
    if (err instanceof AnalysisStopped) {
      // Not the mould's fault: queued again as it was, for whichever worker runs next.
      await ds.query(
        `UPDATE molds SET status = 'queued', attempts = attempts - 1, progress = 0, locked_until = NULL, updated_at = now() WHERE id = $1 AND status = 'analysing'`,
        [mold.id],
      );
      log.info('stopping: mould analysis handed back to the queue');
      return false;
    }
    const giveUp = mold.attempts >= s.maxAttempts;
    const message = err instanceof Error ? err.message : String(err);
    await ds.query(
      `UPDATE molds SET status = $2, error_code = $3, error_message = $4, locked_until = NULL, updated_at = now() WHERE id = $1`,
      giveUp
        ? [mold.id, 'failed', 'analysis_failed', `the analysis failed ${mold.attempts} times (${message}); upload the mould again or simplify it`]
        : [mold.id, 'queued', null, null],
    );
    log.error({ err: message, attempts: mold.attempts }, giveUp ? 'mould analysis failed for good' : 'mould analysis failed; queued again');
  }
  return true;
}

/**
 * Moulds whose stored analysis an older engine wrote go back in the queue: their reports were computed by rules the
 * engine no longer follows (the liquid fill replaced the drop-straight-down rule in version 2).
 */
export async function requeueOutdatedMolds(ds: DataSource, logger: Logger): Promise<number> {
  const rows: unknown[] = await ds.query(
    `UPDATE molds SET status = 'queued', attempts = 0, progress = 0, locked_until = NULL, updated_at = now()
      WHERE status = 'ready' AND COALESCE((analysis->>'version')::int, 0) < $1
      RETURNING id`,
    [cavityAnalysisVersion],
  );
  const n = Array.isArray(rows[0]) ? (rows[0] as unknown[]).length : rows.length;
  if (n > 0) logger.info({ moulds: n }, 'moulds analysed by an older engine queued again');
  return n;
}

/**
 * Every queued mould, one after another. Looking for outdated analyses reads every stored one, so a long-running
 * worker does it once at start (only a new build brings a new engine) rather than before each upload.
 */
export async function analyseQueuedMolds(ds: DataSource, s: MoldAnalysisSettings, logger: Logger, stop?: AbortSignal, requeueOutdated = true): Promise<number> {
  if (requeueOutdated) await requeueOutdatedMolds(ds, logger);
  let n = 0;
  while (!stop?.aborted && (await analyseNextMold(ds, s, logger, stop))) n++;
  return n;
}
