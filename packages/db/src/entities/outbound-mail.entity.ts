import { Check, Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import { CreatedAt } from './columns';

export type OutboundMailStatus = 'pending' | 'sending' | 'sent' | 'failed';

/**
 * Mail is written here in the same transaction as what caused it and sent by the worker, so a crash
 * never loses a message; `messageId` is fixed at insert time so a resend after a crash is recognisable.
 */
@Entity({ name: 'outbound_mail' })
@Check('outbound_mail_status_check', `status IN ('pending', 'sending', 'sent', 'failed')`)
@Index('outbound_mail_due_idx', ['status', 'nextAttemptAt'])
@Index('outbound_mail_dedupe_key', ['dedupeKey'], { unique: true })
export class OutboundMail {
  @PrimaryGeneratedColumn('uuid', { primaryKeyConstraintName: 'outbound_mail_pkey' }) id!: string;
  @Column({ name: 'shop_id', type: 'uuid', nullable: true }) shopId!: string | null;
  @Column({ name: 'dedupe_key', type: 'text' }) dedupeKey!: string;
  @Column({ name: 'message_id', type: 'text' }) messageId!: string;
  @Column({ name: 'to_address', type: 'text' }) toAddress!: string;
  @Column({ type: 'text' }) subject!: string;
  @Column({ name: 'body_text', type: 'text' }) bodyText!: string;
  @Column({ name: 'body_html', type: 'text', nullable: true }) bodyHtml!: string | null;
  @Column({ type: 'text', default: 'pending' }) status!: OutboundMailStatus;
  @Column({ type: 'integer', default: 0 }) attempts!: number;
  @Column({ name: 'next_attempt_at', type: 'timestamptz', default: () => 'now()' }) nextAttemptAt!: Date;
  @Column({ name: 'locked_until', type: 'timestamptz', nullable: true }) lockedUntil!: Date | null;
  @Column({ name: 'last_error', type: 'text', nullable: true }) lastError!: string | null;
  @Column({ name: 'sent_at', type: 'timestamptz', nullable: true }) sentAt!: Date | null;
  @CreatedAt() createdAt!: Date;
}
