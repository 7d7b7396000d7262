import { createServer, type ServerResponse } from 'node:http';
import { connectDataSource, createDataSource } from '@gelpoint/db';
import { createApp } from './app';
import { loadConfig, type Config } from './config';
import { createLogger } from './logger';

function fail(message: string): never {
  process.stderr.write(`api: ${message}\n`);
  process.exit(1);
}

let config: Config;
try {
  config = loadConfig();
} catch (err) {
  fail(err instanceof Error ? err.message : String(err));
}
const logger = createLogger(config.logLevel);

const ds = createDataSource({ url: config.databaseUrl, applicationName: 'gelpoint-api' });
try {
  await connectDataSource(ds);
} catch (err) {
  fail(`cannot reach the database (${err instanceof Error ? err.message : String(err)}); is PostgreSQL running? npm start starts it`);
}

const gelpoint = createApp({ ds, config, logger });
const { app } = gelpoint;
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
// A request that arrives on a kept-alive connection while draining is still answered, but tells the
// client (or the reverse proxy) to open its next connection elsewhere.
server.on('request', (_req, res: ServerResponse) => {
  if (closing) res.setHeader('Connection', 'close');
});

/**
 * Stops accepting connections, lets the requests under way finish (an upload still arriving, a
 * transaction still committing) for up to GELPOINT_SHUTDOWN_GRACE_S, then cuts what is left and
 * closes the pool. A request cut at the deadline rolls back: every change runs in one transaction.
 */
async function shutdown(signal: string) {
  if (closing) return;
  closing = true;
  logger.info({ signal, graceMs: config.shutdownGraceMs }, 'api draining: no new connections');
  const drained = new Promise<void>((resolve) => server.close(() => resolve()));
  // Event streams never finish on their own: they end now, and their browsers reconnect to another instance.
  gelpoint.close();
  // Connections turn idle one by one as their last response goes out.
  const sweep = setInterval(() => server.closeIdleConnections(), 100);
  const deadline = setTimeout(() => {
    logger.warn('api drain deadline passed; cutting the connections still open');
    server.closeAllConnections();
  }, config.shutdownGraceMs);
  await drained;
  clearInterval(sweep);
  clearTimeout(deadline);
  await ds.destroy().catch(() => undefined);
  logger.info('api stopped');
  process.exit(0);
}
process.on('SIGTERM', () => void shutdown('SIGTERM'));
process.on('SIGINT', () => void shutdown('SIGINT'));
