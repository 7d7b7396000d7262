import type { Transporter } from 'nodemailer';
import type { Logger } from 'pino';
import type { DataSource } from 'typeorm';
import type { WorkerConfig } from './config';
import { drainOutboundMail, type DrainResult } from './mail/outbound-mail.sender';
import { analyseQueuedMolds } from './molds/mold-analysis.job';
import { dispatchDueReminders } from './reminders/reminder-dispatch.job';

/**
 * One pass over every kind of due work. Once `stop` is aborted (the worker is shutting down) no job
 * takes anything new: each finishes or hands back what it holds, so another worker picks it up.
 */
export async function runDueWork(
  ds: DataSource,
  transport: Transporter,
  config: WorkerConfig,
  logger: Logger,
  stop: AbortSignal = new AbortController().signal,
): Promise<{ mail: DrainResult; molds: number; reminders: number }> {
  // Reminders first: the mail they queue goes out in the same pass.
  const does = (job: WorkerConfig['jobs'][number]) => config.jobs.includes(job) && !stop.aborted;
  const reminders = does('reminders') ? await dispatchDueReminders(ds, config.publicUrl, logger, 50, stop) : 0;
  const mail = does('mail') ? await drainOutboundMail(ds, transport, { from: config.mailFrom, ...config.mail }, logger, stop) : { sent: 0, failed: 0 };
  const molds = does('molds') ? await analyseQueuedMolds(ds, config.molds, logger, stop) : 0;
  return { mail, molds, reminders };
}
