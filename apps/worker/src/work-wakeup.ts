import pg from 'pg';
import type { Logger } from 'pino';
import { MOLD_ANALYSIS_CHANNEL, OUTBOUND_MAIL_CHANNEL } from '@gelpoint/db';

/**
 * LISTENs for new work (mail, uploaded moulds) so an invitation leaves within a second instead of at
 * the next tick; the tick remains the safety net, so a lost connection only delays it. Reconnects.
 */
export function listenForWork(url: string, onWake: (channel: string) => void, logger: Logger): { close(): Promise<void> } {
  let client: pg.Client | undefined;
  let closed = false;
  let retry: NodeJS.Timeout | undefined;

  const connect = async () => {
    if (closed) return;
    const c = new pg.Client({ connectionString: url, application_name: 'gelpoint-worker-listen' });
    c.on('error', (err) => {
      logger.warn({ err: err.message }, 'wake-up connection lost; reconnecting');
      c.end().catch(() => undefined);
      schedule();
    });
    c.on('notification', (n) => onWake(n.channel));
    try {
      await c.connect();
      await c.query(`LISTEN ${OUTBOUND_MAIL_CHANNEL}`);
      await c.query(`LISTEN ${MOLD_ANALYSIS_CHANNEL}`);
      client = c;
      // Whatever came while the connection was down is looked for now.
      onWake(OUTBOUND_MAIL_CHANNEL);
      onWake(MOLD_ANALYSIS_CHANNEL);
    } catch (err) {
      logger.warn({ err: (err as Error).message }, 'cannot listen for work yet; retrying');
      c.end().catch(() => undefined);
      schedule();
    }
  };
  const schedule = () => {
    if (closed || retry) return;
    retry = setTimeout(() => {
      retry = undefined;
      void connect();
    }, 2_000);
  };
  void connect();
  return {
    async close() {
      closed = true;
      if (retry) clearTimeout(retry);
      await client?.end().catch(() => undefined);
    },
  };
}
