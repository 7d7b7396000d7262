import cron from 'node-cron';
import { pino } from 'pino';
import { connectDataSource, createDataSource, MOLD_ANALYSIS_CHANNEL } from '@gelpoint/db';
import { loadWorkerConfig, type WorkerConfig } from './config';
import { listenForWork } from './work-wakeup';
import { smtpTransport } from './mail/smtp-transport';
import { analyseQueuedMolds } from './molds/mold-analysis.job';
import { SerialRunner } from './serial-runner';
import { runDueWork } from './worker';

const once = process.argv.includes('--once');

function fail(message: string): never {
  process.stderr.write(`worker: ${message}\n`);
  process.exit(1);
}

let config: WorkerConfig;
try {
  config = loadWorkerConfig();
} catch (err) {
  fail((err as Error).message);
}
if (!cron.validate(config.cron)) fail(`GELPOINT_WORKER_CRON "${config.cron}" is not a cron expression`);

const logger = pino({ level: config.logLevel }).child({ process: 'worker' });
const ds = createDataSource({ url: config.databaseUrl, applicationName: 'gelpoint-worker', poolSize: 4 });
try {
  await connectDataSource(ds);
} catch (err) {
  fail(`cannot reach the database (${(err as Error).message}); is PostgreSQL running? npm start starts it`);
}
const transport = smtpTransport(config.smtp);

if (once) {
  const result = await runDueWork(ds, transport, config, logger);
  process.stdout.write(
    `worker: sent ${result.mail.sent} mail, ${result.mail.failed} failed (will be retried); analysed ${result.molds} mould(s); ${result.reminders} reminder(s) came due; ${result.digests} morning digest(s)\n`,
  );
  transport.close();
  await ds.destroy();
  process.exit(0);
}

const stopping = new AbortController();
const onError = (err: unknown) => logger.error({ err }, 'worker pass failed; the next tick tries again');
// Moulds have a runner of their own, so an upload is analysed at once even while a pass is sending mail.
const otherJobs = config.jobs.filter((j) => j !== 'molds');
const chores = new SerialRunner(async () => {
  if (stopping.signal.aborted || otherJobs.length === 0) return;
  await runDueWork(ds, transport, { ...config, jobs: otherJobs }, logger, stopping.signal);
}, onError);
let firstMouldPass = true;
const moulds = new SerialRunner(async () => {
  if (stopping.signal.aborted || !config.jobs.includes('molds')) return;
  await analyseQueuedMolds(ds, config.molds, logger, stopping.signal, firstMouldPass);
  firstMouldPass = false;
}, onError);
const wakeAll = () => {
  chores.wake();
  moulds.wake();
};
const task = cron.schedule(config.cron, wakeAll, { name: 'gelpoint-tick', noOverlap: true });
const wakeup = listenForWork(config.databaseUrl, (channel) => (channel === MOLD_ANALYSIS_CHANNEL ? moulds : chores).wake(), logger);
// Listening for the stop signals before the line that says it started: whoever reads that line may stop it at once.
process.on('SIGTERM', () => void shutdown('SIGTERM'));
process.on('SIGINT', () => void shutdown('SIGINT'));
logger.info({ cron: config.cron }, 'worker started');
wakeAll();

/**
 * Takes nothing new, lets the send under way finish and be recorded, and hands back whatever else it
 * had claimed (mail, a mould under analysis) so another worker takes it at once. Reminders are
 * claimed, queued and marked in one transaction, so one cut short rolls back whole. Past
 * GELPOINT_SHUTDOWN_GRACE_S the process exits anyway; what it still held then comes back when its
 * lease runs out, under the same Message-ID.
 */
async function shutdown(signal: string) {
  if (stopping.signal.aborted) return;
  stopping.abort();
  logger.info({ signal, graceMs: config.shutdownGraceMs }, 'worker stopping: finishing the send under way, handing back the rest');
  await task.stop();
  await wakeup.close();
  const deadline = new Promise<boolean>((resolve) => setTimeout(() => resolve(false), config.shutdownGraceMs).unref());
  const finished = await Promise.race([Promise.all([chores.idle(), moulds.idle()]).then(() => true), deadline]);
  if (!finished) logger.warn('worker stop deadline passed; what it still holds is retried after its lease');
  transport.close();
  await ds.destroy().catch(() => undefined);
  logger.info('worker stopped');
  process.exit(finished ? 0 : 1);
}
