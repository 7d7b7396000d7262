import type { Transporter } from 'nodemailer';
import type { Logger } from 'pino';
import type { DataSource } from 'typeorm';
import type { WorkerConfig } from './config';
import { drainOutboundMail, type DrainResult } from './mail/outbound-mail.sender';
import { analyseQueuedMolds } from './molds/mold-analysis.job';
import { dispatchDueReminders } from './reminders/reminder-dispatch.job';

/** One pass over every kind of due work. Later jobs (reminders, analyses) join here. */
export async function runDueWork(ds: DataSource, transport: Transporter, config: WorkerConfig, logger: Logger): Promise<{ mail: DrainResult; molds: number; reminders: number }> {
  // Reminders first: the mail they queue goes out in the same pass.
  const does = (job: WorkerConfig['jobs'][number]) => config.jobs.includes(job);
  const reminders = does('reminders') ? await dispatchDueReminders(ds, config.publicUrl, logger) : 0;
  const mail = does('mail') ? await drainOutboundMail(ds, transport, { from: config.mailFrom, ...config.mail }, logger) : { sent: 0, failed: 0 };
  const molds = does('molds') ? await analyseQueuedMolds(ds, config.molds, logger) : 0;
  return { mail, molds, reminders };
}
