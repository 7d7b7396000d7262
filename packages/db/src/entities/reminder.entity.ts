import { Check, Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import type { ReminderKind } from '@gelpoint/core';
import { CreatedAt, UpdatedAt } from './columns';
import { Pour } from './pour.entity';

// The kinds are the cure model's (packages/core/src/pour-cure.ts): a reminder row stores what it computed.
export type { ReminderKind };

/**
 * A reminder is a row: recomputed while pending when readings or batches arrive, claimed by one
 * worker when due, and turned into outbound mail in the same transaction, so it is sent once.
 */
@Entity({ name: 'reminders' })
@Check('reminders_status_check', `status IN ('pending', 'sent', 'cancelled')`)
@Check('reminders_done_how_check', `done_how IN ('logged', 'marked')`)
@Index('reminders_due_idx', ['status', 'dueAt'])
@Index('reminders_pour_key', ['pourId', 'kind', 'step'], { unique: true })
export class Reminder {
  @PrimaryGeneratedColumn('uuid', { primaryKeyConstraintName: 'reminders_pkey' }) id!: string;
  @Column({ name: 'shop_id', type: 'uuid' }) shopId!: string;
  @Column({ name: 'pour_id', type: 'uuid' }) pourId!: string;
  @Column({ type: 'text' }) kind!: ReminderKind;
  /** Which step it belongs to: 'seal_coat:1', 'layer:2', 'finish:3'. */
  @Column({ type: 'text' }) step!: string;
  /** When the reminder goes out: a closing window's lead time before the step, otherwise the step itself. */
  @Column({ name: 'due_at', type: 'timestamptz' }) dueAt!: Date;
  /** The moment of the step (a window opening or closing, demold, ready to machine). */
  @Column({ name: 'event_at', type: 'timestamptz' }) eventAt!: Date;
  /** Minutes between the mail and the step it announces. */
  @Column({ name: 'lead_min', type: 'integer', default: 0 }) leadMin!: number;
  @Column({ type: 'text', default: 'pending' }) status!: 'pending' | 'sent' | 'cancelled';
  /** True when the due time rests on the assumed temperature rather than logged readings. */
  @Column({ type: 'boolean', default: false }) assumed!: boolean;
  @Column({ type: 'text' }) title!: string;
  @Column({ name: 'sent_at', type: 'timestamptz', nullable: true }) sentAt!: Date | null;
  /** Done: its step was logged (a layer poured, a check, a release), or a member marked it done. */
  @Column({ name: 'done_at', type: 'timestamptz', nullable: true }) doneAt!: Date | null;
  @Column({ name: 'done_by_id', type: 'uuid', nullable: true }) doneById!: string | null;
  @Column({ name: 'done_how', type: 'text', nullable: true }) doneHow!: 'logged' | 'marked' | null;
  /** Falls in the shop's quiet hours: it goes out with the morning digest, not on its own. */
  @Column({ name: 'via_digest', type: 'boolean', default: false }) viaDigest!: boolean;
  /** Who gets it when not the pour's own list (a release goes to the maker and the leads). */
  @Column({ name: 'recipient_user_ids', type: 'uuid', array: true, nullable: true }) recipientUserIds!: string[] | null;
  @ManyToOne(() => Pour, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'pour_id', foreignKeyConstraintName: 'reminders_pour_fk' })
  pour?: Pour;
  @CreatedAt() createdAt!: Date;
  @UpdatedAt() updatedAt!: Date;
}
