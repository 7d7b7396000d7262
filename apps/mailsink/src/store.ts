import { mkdir, open, readFile, type FileHandle } from 'node:fs/promises';
import { join } from 'node:path';
import { decodeLog, encodeLogLine } from './message-log';
import { MailSinkError } from './sink-error';
import type { SinkMessage } from './sink-message';

export const MESSAGE_LOG_FILE = 'messages.jsonl';

export interface MessageStore {
  /** Newest first. */
  list(): SinkMessage[];
  find(id: string): SinkMessage | undefined;
  /**
   * Resolves once the message is on disk (fsync'd), so it can be acknowledged to the sender. Like a
   * provider honouring an idempotency key, a repeat of a Message-ID already held is accepted but not
   * kept again: it resolves false.
   */
  append(message: SinkMessage): Promise<boolean>;
  clear(): Promise<void>;
  close(): Promise<void>;
  readonly skippedLines: number;
}

export async function openMessageStore(dataDir: string): Promise<MessageStore> {
  const path = join(dataDir, MESSAGE_LOG_FILE);
  let handle: FileHandle;
  let content: Buffer;
  try {
    await mkdir(dataDir, { recursive: true });
    content = await readExisting(path);
    handle = await open(path, 'a');
  } catch (cause) {
    throw new MailSinkError(
      'DATA_DIR_UNUSABLE',
      `the data folder ${dataDir} cannot be used (${describe(cause)}) — make it writable or set MAILSINK_DATA_DIR to another folder`,
    );
  }
  const decoded = decodeLog(content);
  if (decoded.intactBytes < content.byteLength) {
    // Without this the next message would be glued onto the unterminated tail.
    if (decoded.tailIsMessage) await handle.write('\n');
    else await handle.truncate(decoded.intactBytes);
    await handle.sync();
  }
  if (content.byteLength === 0) await syncFolder(dataDir);

  const messages = decoded.messages;
  let fileBytes = decoded.tailIsMessage ? content.byteLength + 1 : decoded.intactBytes;
  // One write at a time, in arrival order, so lines never interleave and clear() is ordered too.
  let queue: Promise<void> = Promise.resolve();
  const enqueue = <T>(work: () => Promise<T>): Promise<T> => {
    const next = queue.then(work);
    queue = next.then(
      () => undefined,
      () => undefined,
    );
    return next;
  };

  return {
    skippedLines: decoded.skippedLines,
    list: () => [...messages].reverse(),
    find: (id) => messages.find((message) => message.id === id),
    append: (message) =>
      enqueue(async () => {
        if (message.messageId && messages.some((m) => m.messageId === message.messageId)) return false;
        const line = Buffer.from(encodeLogLine(message), 'utf8');
        try {
          await handle.write(line);
          await handle.sync();
        } catch (cause) {
          // Cut off whatever part of the line made it, so the log stays one message per line.
          await handle.truncate(fileBytes).catch(() => undefined);
          throw cause;
        }
        fileBytes += line.byteLength;
        messages.push(message);
        return true;
      }),
    clear: () =>
      enqueue(async () => {
        await handle.truncate(0);
        await handle.sync();
        fileBytes = 0;
        messages.length = 0;
      }),
    close: async () => {
      await queue;
      await handle.close();
    },
  };
}

async function readExisting(path: string): Promise<Buffer> {
  try {
    return await readFile(path);
  } catch (cause) {
    if (isNodeError(cause) && cause.code === 'ENOENT') return Buffer.alloc(0);
    throw cause;
  }
}

// A new file's directory entry is only durable once the folder itself is fsync'd.
async function syncFolder(dataDir: string): Promise<void> {
  const folder = await open(dataDir, 'r');
  try {
    await folder.sync();
  } finally {
    await folder.close();
  }
}

function isNodeError(value: unknown): value is NodeJS.ErrnoException {
  return value instanceof Error && 'code' in value;
}

function describe(cause: unknown): string {
  if (isNodeError(cause) && cause.code) return cause.code;
  return cause instanceof Error ? cause.message : String(cause);
}
