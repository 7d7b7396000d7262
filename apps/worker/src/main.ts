import cron from 'node-cron';
import { pino } from 'pino';
import { connectDataSource, createDataSource } from '@gelpoint/db';
import { loadWorkerConfig } from './config';
import { listenForWork } from './work-wakeup';
import { smtpTransport } from './mail/smtp-transport';
import { SerialRunner } from './serial-runner';
import { runDueWork } from './worker';

const once = process.argv.includes('--once');

function fail(message: string): never {
  process.stderr.write(`worker: ${message}\n`);
  process.exit(1);
}

let config;
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
  process.stdout.write(`worker: sent ${result.mail.sent} mail, ${result.mail.failed} failed (will be retried); analysed ${result.molds} mould(s); ${result.reminders} reminder(s) came due\n`);
  transport.close();
  await ds.destroy();
  process.exit(0);
}

const runner = new SerialRunner(
  async () => {
    await runDueWork(ds, transport, config, logger);
  },
  (err) => logger.error({ err }, 'worker pass failed; the next tick tries again'),
);
const task = cron.schedule(config.cron, () => runner.wake(), { name: 'gelpoint-tick', noOverlap: true });
const wakeup = listenForWork(config.databaseUrl, () => runner.wake(), logger);
logger.info({ cron: config.cron }, 'worker started');
runner.wake();

let stopping = false;
async function shutdown(signal: string) {
  if (stopping) return;
  stopping = true;
  logger.info({ signal }, 'worker stopping after the current pass');
  await task.stop();
  await wakeup.close();
  await runner.idle();
  transport.close();
  await ds.destroy().catch(() => undefined);
  process.exit(0);
}
process.on('SIGTERM', () => void shutdown('SIGTERM'));
process.on('SIGINT', () => void shutdown('SIGINT'));
