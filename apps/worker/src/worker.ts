import type { Transporter } from 'nodemailer';
import type { Logger } from 'pino';
import type { DataSource } from 'typeorm';
import type { WorkerConfig } from './config';
import { drainOutboundMail, type DrainResult } from './mail/outbound-mail.sender';
import { analyseQueuedMolds } from './molds/mold-analysis.job';

/** One pass over every kind of due work. Later jobs (reminders, analyses) join here. */
export async function runDueWork(ds: DataSource, transport: Transporter, config: WorkerConfig, logger: Logger): Promise<{ mail: DrainResult; molds: number }> {
  const mail = await drainOutboundMail(ds, transport, { from: config.mailFrom, ...config.mail }, logger);
  const molds = await analyseQueuedMolds(ds, config.molds, logger);
  return { mail, molds };
}
