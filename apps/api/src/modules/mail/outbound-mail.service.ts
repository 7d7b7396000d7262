import { randomUUID } from 'node:crypto';
import type { EntityManager } from 'typeorm';
import { OUTBOUND_MAIL_CHANNEL, OutboundMail } from '@gelpoint/db';

export interface MailToSend {
  shopId: string | null;
  /** One message per key, ever: a retried request cannot queue the same mail twice. */
  dedupeKey: string;
  to: string;
  subject: string;
  text: string;
}

/**
 * Queues a message in the caller's transaction; the worker sends it (woken at once by NOTIFY, which
 * PostgreSQL delivers only on commit). The Message-ID is fixed here so a resend is recognisable.
 */
export async function queueMail(m: EntityManager, mail: MailToSend, mailDomain: string): Promise<void> {
  const id = randomUUID();
  await m
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
}

export function mailDomainOf(publicUrl: string): string {
  return new URL(publicUrl).hostname || 'gelpoint.local';
}
