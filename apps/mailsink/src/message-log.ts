import type { SinkMessage } from './sink-message';

export interface DecodedLog {
  messages: SinkMessage[];
  /** Lines that were not a message (hand edits, a torn write); they are left out, not fatal. */
  skippedLines: number;
  /**
   * Byte length of the part of the file that ends on a line break and can be appended to.
   * Anything after it is a write the sink never acknowledged.
   */
  intactBytes: number;
  /** The unterminated tail is itself a whole message and only lacks its line break. */
  tailIsMessage: boolean;
}

export function encodeLogLine(message: SinkMessage): string {
  // JSON.stringify escapes line breaks inside strings, so one message is always one line.
  return `${JSON.stringify(message)}\n`;
}

export function decodeLog(content: Buffer): DecodedLog {
  const lastBreak = content.lastIndexOf(0x0a);
  const intactBytes = lastBreak + 1;
  const lines = content.subarray(0, intactBytes).toString('utf8').split('\n');
  const messages: SinkMessage[] = [];
  let skippedLines = 0;
  for (const line of lines) {
    if (line.trim() === '') continue;
    const message = decodeLine(line);
    if (message) messages.push(message);
    else skippedLines += 1;
  }
  const tail = content.subarray(intactBytes).toString('utf8');
  const tailMessage = tail.trim() === '' ? null : decodeLine(tail);
  if (tailMessage) messages.push(tailMessage);
  else if (tail.trim() !== '') skippedLines += 1;
  return { messages, skippedLines, intactBytes, tailIsMessage: tailMessage !== null };
}

function decodeLine(line: string): SinkMessage | null {
  let value: unknown;
  try {
    value = JSON.parse(line);
  } catch {
    return null;
  }
  return looksLikeMessage(value) ? value : null;
}

function looksLikeMessage(value: unknown): value is SinkMessage {
  if (typeof value !== 'object' || value === null) return false;
  const record = value as Record<string, unknown>;
  return (
    typeof record.id === 'string' &&
    typeof record.receivedAt === 'string' &&
    typeof record.subject === 'string' &&
    typeof record.text === 'string' &&
    Array.isArray(record.to)
  );
}
