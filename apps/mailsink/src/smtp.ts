import { SMTPServer, type SMTPServerDataStream, type SMTPServerSession } from 'smtp-server';
import type { ReceivedEnvelope } from './parse';

export const MAX_MESSAGE_BYTES = 10 * 1024 * 1024;

export interface SmtpReceiver {
  /** Resolves with the sink's id once the message is stored; only then is 250 answered. */
  accept(raw: Buffer, envelope: ReceivedEnvelope): Promise<string>;
}

export function createSmtpServer(receiver: SmtpReceiver, maxMessageBytes = MAX_MESSAGE_BYTES): SMTPServer {
  return new SMTPServer({
    // A stand-in for the provider: anyone may send to anyone, with or without AUTH, in clear text.
    authOptional: true,
    allowInsecureAuth: true,
    disabledCommands: ['STARTTLS'],
    size: maxMessageBytes,
    disableReverseLookup: true,
    logger: false,
    closeTimeout: 5_000,
    onAuth(_auth, _session, callback) {
      callback(null, { user: 'anyone' });
    },
    onData(stream, session, callback) {
      readAll(stream)
        .then(async (raw) => {
          if (stream.sizeExceeded) {
            callback(withResponseCode(new Error(`message exceeds the sink's limit of ${maxMessageBytes} bytes`), 552));
            return;
          }
          const id = await receiver.accept(raw, envelopeOf(session));
          callback(null, `stored as ${id}`);
        })
        .catch((cause: unknown) => {
          const reason = cause instanceof Error ? cause.message : String(cause);
          // 451 is transient: the sender keeps the message and retries, so nothing is lost.
          callback(withResponseCode(new Error(`the sink could not store the message (${reason})`), 451));
        });
    },
  });
}

function readAll(stream: SMTPServerDataStream): Promise<Buffer> {
  return new Promise((resolve, reject) => {
    const chunks: Buffer[] = [];
    stream.on('data', (chunk: Buffer) => {
      // Past the limit, keep draining the stream but stop holding on to it.
      if (!stream.sizeExceeded) chunks.push(chunk);
    });
    stream.once('end', () => resolve(Buffer.concat(chunks)));
    stream.once('error', reject);
  });
}

function envelopeOf(session: SMTPServerSession): ReceivedEnvelope {
  const { mailFrom, rcptTo } = session.envelope;
  return {
    mailFrom: mailFrom ? mailFrom.address : null,
    rcptTo: rcptTo.map((recipient) => recipient.address),
  };
}

function withResponseCode(error: Error, responseCode: number): Error {
  return Object.assign(error, { responseCode });
}
