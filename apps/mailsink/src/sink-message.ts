/** One received mail as the sink keeps it on disk and serves it over HTTP. */
export interface SinkMessage {
  /** Made by the sink when the message is accepted; never changes. */
  id: string;
  /** ISO 8601, when the sink accepted the message. */
  receivedAt: string;
  /** The Message-ID header exactly as sent (angle brackets included), or null when absent. */
  messageId: string | null;
  /** ISO 8601 from the Date header; the receive time when the header is missing or unreadable. */
  date: string;
  /** Address from the From header, empty when there is none. */
  from: string;
  /** Addresses from the To header. */
  to: string[];
  /** Addresses from the Cc header. */
  cc: string[];
  subject: string;
  /** The plain-text body as the sender passed it (a single-part body's closing line break removed). */
  text: string;
  /** The HTML body, or null for a text-only mail. Never render it outside a sandboxed frame. */
  html: string | null;
  /** What the client said in MAIL FROM / RCPT TO; Bcc recipients only show up here. */
  envelope: { mailFrom: string | null; rcptTo: string[] };
  sizeBytes: number;
}

/** A recipient matches when it appears in To, Cc or the SMTP envelope, ignoring case. */
export function isAddressedTo(message: SinkMessage, address: string): boolean {
  const wanted = address.trim().toLowerCase();
  return [...message.to, ...message.cc, ...message.envelope.rcptTo].some((recipient) => recipient.toLowerCase() === wanted);
}
