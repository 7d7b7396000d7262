import type { Transporter } from 'nodemailer';
import type { Logger } from 'pino';
import type { DataSource } from 'typeorm';
import type { WorkerConfig } from './config';
import { drainOutboundMail, type DrainResult } from './mail/outbound-mail.sender';
import { analyseQueuedMolds } from './molds/mold-analysis.job';
import { sendMorningDigests } from './reminders/morning-digest.job';
import { dispatchDueReminders } from './reminders/reminder-dispatch.job';

/**
 * One pass over every kind of due work. Once `stop` is aborted (the worker is shutting down) no job
 * takes anything new: each finishes or hands back what it holds, so another worker picks it up.
 * A job that fails does not hold up the others (a mould still gets analysed when a reminder query
 * fails); the pass then fails with the first error, which the caller logs, and the next tick retries.
 */
export async function runDueWork(
  ds: DataSource,
  transport: Transporter,
  config: WorkerConfig,
  logger: Logger,
  stop: AbortSignal = new AbortController().signal,
): Promise<{ mail: DrainResult; molds: number; reminders: number; digests: number }> {
  const errors: unknown[] = [];
  const run = async <T>(job: WorkerConfig['jobs'][number], work: () => Promise<T>, none: T): Promise<T> => {
    if (!config.jobs.includes(job) || stop.aborted) return none;
    try {
      return await work();
    } catch (err) {
      errors.push(err);
      return none;
    }
  };
  // Reminders and digests first: the mail they queue goes out in the same pass.
  const reminders = await run('reminders', () => dispatchDueReminders(ds, config.publicUrl, logger, 50, stop), 0);
  const digests = await run('reminders', () => sendMorningDigests(ds, config.publicUrl, logger), 0);
  const mail = await run('mail', () => drainOutboundMail(ds, transport, { from: config.mailFrom, ...config.mail }, logger, stop), { sent: 0, failed: 0 });
  const molds = await run('molds', () => analyseQueuedMolds(ds, config.molds, logger, stop), 0);
  if (errors.length > 0) throw errors[0];
  return { mail, molds, reminders, digests };
}
