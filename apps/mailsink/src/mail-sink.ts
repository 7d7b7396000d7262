import { randomUUID } from 'node:crypto';
import { createServer, type Server } from 'node:http';
import { createHttpApp } from './http';
import { listenOn } from './listen';
import { parseMessage, type ReceivedEnvelope } from './parse';
import type { SinkMessage } from './sink-message';
import { createSmtpServer, MAX_MESSAGE_BYTES } from './smtp';
import { openMessageStore } from './store';

export interface MailSinkOptions {
  host: string;
  /** 0 picks a free port; the bound one is on the returned sink. */
  smtpPort: number;
  httpPort: number;
  dataDir: string;
  maxMessageBytes?: number;
  /** Called after a message is on disk and before the sender hears 250. */
  onMessage?: (message: SinkMessage) => void;
  /** Trouble after start-up that is not fatal, e.g. a client dropping its connection mid-session. */
  onProblem?: (description: string) => void;
}

export interface MailSink {
  smtpPort: number;
  httpPort: number;
  /** Newest first. */
  messages(): SinkMessage[];
  /** Stops both servers, waits for messages in flight and closes the log. Safe to call twice. */
  close(): Promise<void>;
}

export async function createMailSink(options: MailSinkOptions): Promise<MailSink> {
  const store = await openMessageStore(options.dataDir);
  let started = false;
  const inFlight = new Set<Promise<unknown>>();

  const receive = async (raw: Buffer, envelope: ReceivedEnvelope): Promise<string> => {
    const message = await parseMessage(raw, envelope, { id: randomUUID(), receivedAt: new Date() });
    if (await store.append(message)) options.onMessage?.(message);
    return message.id;
  };

  const smtp = createSmtpServer(
    {
      accept(raw, envelope) {
        const receiving = receive(raw, envelope);
        inFlight.add(receiving);
        void receiving.finally(() => inFlight.delete(receiving)).catch(() => undefined);
        return receiving;
      },
    },
    options.maxMessageBytes ?? MAX_MESSAGE_BYTES,
  );
  // smtp-server re-emits socket and listen errors; an unheard 'error' event would crash the process.
  smtp.on('error', (error: Error) => {
    if (started) options.onProblem?.(`SMTP: ${error.message}`);
  });

  let smtpPort: number;
  try {
    smtpPort = await listenOn(smtp.server, 'smtp', options.host, options.smtpPort);
  } catch (error) {
    await store.close();
    throw error;
  }

  const http = createServer(createHttpApp(store, { host: options.host, port: smtpPort }));
  let httpPort: number;
  try {
    httpPort = await listenOn(http, 'http', options.host, options.httpPort);
  } catch (error) {
    await closeSmtp(smtp);
    await store.close();
    throw error;
  }
  started = true;

  let closing: Promise<void> | undefined;
  return {
    smtpPort,
    httpPort,
    messages: () => store.list(),
    close() {
      closing ??= (async () => {
        await Promise.all([closeSmtp(smtp), closeHttp(http)]);
        // A session cut off by the SMTP close timeout may still be parsing; let it reach the log.
        await Promise.allSettled([...inFlight]);
        await store.close();
      })();
      return closing;
    },
  };
}

function closeSmtp(smtp: ReturnType<typeof createSmtpServer>): Promise<void> {
  return new Promise((resolve) => smtp.close(() => resolve()));
}

function closeHttp(http: Server): Promise<void> {
  return new Promise((resolve) => {
    http.close(() => resolve());
    http.closeIdleConnections();
  });
}
