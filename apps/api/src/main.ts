import { createServer } from 'node:http';
import { connectDataSource, createDataSource } from '@gelpoint/db';
import { createApp } from './app';
import { loadConfig } from './config';
import { createLogger } from './logger';

const logger = createLogger(process.env.GELPOINT_LOG_LEVEL ?? 'info');

function fail(message: string): never {
  process.stderr.write(`api: ${message}\n`);
  process.exit(1);
}

let config;
try {
  config = loadConfig();
} catch (err) {
  fail(err instanceof Error ? err.message : String(err));
}

const ds = createDataSource({ url: config.databaseUrl, applicationName: 'gelpoint-api' });
try {
  await connectDataSource(ds);
} catch (err) {
  fail(`cannot reach the database (${err instanceof Error ? err.message : String(err)}); is PostgreSQL running? npm start starts it`);
}

const { app } = createApp({ ds, config, logger });
const server = createServer(app);
server.keepAliveTimeout = 65_000;
server.on('error', (err: NodeJS.ErrnoException) => {
  if (err.code === 'EADDRINUSE') fail(`port ${config.port} on ${config.host} is already in use — stop the other process or set GELPOINT_API_PORT`);
  fail(err.message);
});
server.listen(config.port, config.host, () => {
  logger.info({ url: config.publicUrl }, 'api listening');
});

let closing = false;
async function shutdown(signal: string) {
  if (closing) return;
  closing = true;
  logger.info({ signal }, 'api shutting down');
  server.close();
  server.closeIdleConnections();
  setTimeout(() => server.closeAllConnections(), 5_000).unref();
  await ds.destroy().catch(() => undefined);
  process.exit(0);
}
process.on('SIGTERM', () => void shutdown('SIGTERM'));
process.on('SIGINT', () => void shutdown('SIGINT'));
