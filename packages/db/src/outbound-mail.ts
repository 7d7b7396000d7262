import { randomUUID } from 'node:crypto';
import type { EntityManager } from 'typeorm';
import { OUTBOUND_MAIL_CHANNEL } from './channels';
import { OutboundMail } from './entities';

export interface MailToSend {
  shopId: string | null;
  /** One message per key, ever: a retried request or a second worker cannot queue the same mail twice. */
  dedupeKey: string;
  to: string;
  subject: string;
  text: string;
}

/**
 * Queues a message in the caller's transaction; the worker sends it (woken at once by NOTIFY, which
 * PostgreSQL delivers only on commit). The Message-ID is fixed here so a resend is recognisable.
 * Returns false when a message with that key was already queued.
 */
export async function queueMail(m: EntityManager, mail: MailToSend, mailDomain: string): Promise<boolean> {
  const id = randomUUID();
  const inserted = await m
    .createQueryBuilder()
    .insert()
    .into(OutboundMail)
    .values({
      id,
      shopId: mail.shopId,
      dedupeKey: mail.dedupeKey,
      messageId: `<${id}@${mailDomain}>`,
      toAddress: mail.to,
      subject: mail.subject,
      bodyText: mail.text,
      bodyHtml: null,
    })
    .orIgnore()
    .execute();
  await m.query('SELECT pg_notify($1, $2)', [OUTBOUND_MAIL_CHANNEL, id]);
  return (inserted.identifiers.length > 0 && inserted.raw.length > 0) || false;
}

export function mailDomainOf(publicUrl: string): string {
  return new URL(publicUrl).hostname || 'gelpoint.local';
}
