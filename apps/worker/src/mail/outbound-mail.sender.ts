import type { Transporter } from 'nodemailer';
import type { Logger } from 'pino';
import type { DataSource } from 'typeorm';

export interface MailSenderSettings {
  from: string;
  batch: number;
  retryBaseS: number;
  maxAttempts: number;
  leaseS: number;
}

interface ClaimedMail {
  id: string;
  message_id: string;
  to_address: string;
  subject: string;
  body_text: string;
  body_html: string | null;
  attempts: number;
}

export interface DrainResult {
  sent: number;
  failed: number;
}

/** Backoff that doubles per attempt, capped at an hour: an outage is waited out, not hammered. */
export function retryDelayS(attempts: number, baseS: number): number {
  return Math.min(3600, baseS * 2 ** Math.max(0, attempts - 1));
}

/**
 * Claims due rows with SKIP LOCKED so any number of workers share the queue, each row once. A row
 * stays leased while it is being sent; if the worker dies before recording the send, the lease runs
 * out and the row is sent again with the same Message-ID, which the provider uses to drop the copy.
 */
export async function claimDueMail(ds: DataSource, s: MailSenderSettings): Promise<ClaimedMail[]> {
  // Wrapped in a CTE so the driver hands back rows (TypeORM answers a bare UPDATE with [rows, count]).
  return ds.query(
    `WITH claimed AS (
     UPDATE outbound_mail o
        SET status = 'sending', attempts = o.attempts + 1, locked_until = now() + make_interval(secs => $2)
      WHERE o.id IN (
        SELECT id FROM outbound_mail
         WHERE (status = 'pending' AND next_attempt_at <= now())
            OR (status = 'sending' AND locked_until < now())
         ORDER BY next_attempt_at
         LIMIT $1
         FOR UPDATE SKIP LOCKED)
      RETURNING o.id, o.message_id, o.to_address, o.subject, o.body_text, o.body_html, o.attempts)
     SELECT * FROM claimed`,
    [s.batch, s.leaseS],
  );
}

export async function sendClaimedMail(ds: DataSource, transport: Transporter, s: MailSenderSettings, mail: ClaimedMail, logger: Logger): Promise<boolean> {
  try {
    await transport.sendMail({
      from: s.from,
      to: mail.to_address,
      subject: mail.subject,
      text: mail.body_text,
      ...(mail.body_html ? { html: mail.body_html } : {}),
      messageId: mail.message_id,
      headers: { 'X-Gelpoint-Mail-Id': mail.id },
    });
  } catch (err) {
    const giveUp = mail.attempts >= s.maxAttempts;
    const message = err instanceof Error ? err.message : String(err);
    await ds.query(
      `UPDATE outbound_mail SET status = $2, locked_until = NULL, last_error = $3,
              next_attempt_at = now() + make_interval(secs => $4)
        WHERE id = $1 AND status = 'sending'`,
      [mail.id, giveUp ? 'failed' : 'pending', message.slice(0, 500), retryDelayS(mail.attempts, s.retryBaseS)],
    );
    logger.warn({ mailId: mail.id, attempts: mail.attempts, err: message }, giveUp ? 'mail failed for good' : 'mail send failed; will retry');
    return false;
  }
  await ds.query(`UPDATE outbound_mail SET status = 'sent', sent_at = now(), locked_until = NULL, last_error = NULL WHERE id = $1`, [mail.id]);
  logger.info({ mailId: mail.id, to: mail.to_address }, 'mail sent');
  return true;
}

/**
 * Hands claimed rows that were not sent back to the queue at once, as if never claimed, so another
 * worker sends them now rather than after the lease (a shutting-down worker must not sit on them).
 */
export async function releaseClaimedMail(ds: DataSource, ids: string[]): Promise<void> {
  if (ids.length === 0) return;
  await ds.query(
    `UPDATE outbound_mail SET status = 'pending', attempts = attempts - 1, locked_until = NULL
      WHERE id = ANY($1) AND status = 'sending'`,
    [ids],
  );
}

/**
 * Sends everything due now, batch after batch, until nothing is left that this worker can claim.
 * When `stop` is aborted, the send under way finishes and is recorded; the rest is released.
 */
export async function drainOutboundMail(
  ds: DataSource,
  transport: Transporter,
  s: MailSenderSettings,
  logger: Logger,
  stop?: AbortSignal,
): Promise<DrainResult> {
  const result: DrainResult = { sent: 0, failed: 0 };
  while (!stop?.aborted) {
    const claimed = await claimDueMail(ds, s);
    if (claimed.length === 0) return result;
    for (const [i, mail] of claimed.entries()) {
      if (stop?.aborted) {
        const rest = claimed.slice(i).map((m) => m.id);
        await releaseClaimedMail(ds, rest);
        logger.info({ released: rest.length }, 'stopping: unsent mail handed back to the queue');
        return result;
      }
      if (await sendClaimedMail(ds, transport, s, mail, logger)) result.sent++;
      else result.failed++;
    }
  }
  return result;
}
