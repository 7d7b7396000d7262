import { simpleParser, type AddressObject, type EmailAddress, type ParsedMail } from 'mailparser';
import type { SinkMessage } from './sink-message';

export interface ReceivedEnvelope {
  mailFrom: string | null;
  rcptTo: string[];
}

export interface ReceiptStamp {
  id: string;
  receivedAt: Date;
}

export async function parseMessage(raw: Buffer, envelope: ReceivedEnvelope, stamp: ReceiptStamp): Promise<SinkMessage> {
  // Attachments and the text→HTML rendering are not shown by the sink, so skip that work.
  const parsed = await simpleParser(raw, { skipTextToHtml: true, skipTextLinks: true });
  const receivedAt = stamp.receivedAt.toISOString();
  return {
    id: stamp.id,
    receivedAt,
    messageId: parsed.messageId ?? null,
    date: isValidDate(parsed.date) ? parsed.date.toISOString() : receivedAt,
    from: addressesOf(parsed.from)[0] ?? '',
    to: addressesOf(parsed.to),
    cc: addressesOf(parsed.cc),
    subject: parsed.subject ?? '',
    text: bodyText(parsed),
    html: typeof parsed.html === 'string' ? parsed.html : null,
    envelope: { mailFrom: envelope.mailFrom, rcptTo: [...envelope.rcptTo] },
    sizeBytes: raw.byteLength,
  };
}

// RFC 5321 §4.1.1.4: a single-part body ends with the CRLF of its last line, while inside a multipart
// the CRLF before a boundary belongs to the boundary (RFC 2046 §5.1.1). Dropping that one line end
// gives back the text the sender passed in either case. (Both sections cited from memory.)
function bodyText(parsed: ParsedMail): string {
  const text = parsed.text ?? '';
  return isMultipart(parsed) ? text : text.replace(/\r?\n$/, '');
}

function isMultipart(parsed: ParsedMail): boolean {
  const contentType = parsed.headers.get('content-type');
  const value = typeof contentType === 'object' && contentType !== null && 'value' in contentType ? contentType.value : contentType;
  return typeof value === 'string' && value.toLowerCase().startsWith('multipart/');
}

function isValidDate(date: Date | undefined): date is Date {
  return date instanceof Date && !Number.isNaN(date.getTime());
}

function addressesOf(header: AddressObject | AddressObject[] | undefined): string[] {
  if (header === undefined) return [];
  const objects = Array.isArray(header) ? header : [header];
  return objects.flatMap((object) => flattenGroups(object.value));
}

// RFC 5322 §3.4 lets an address list hold named groups; their members are recipients too.
function flattenGroups(entries: EmailAddress[]): string[] {
  return entries.flatMap((entry) => {
    const own = entry.address ? [entry.address] : [];
    return [...own, ...(entry.group ? flattenGroups(entry.group) : [])];
  });
}
