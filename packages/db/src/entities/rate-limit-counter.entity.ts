import { Column, Entity, Index, PrimaryColumn } from 'typeorm';

/**
 * One client's hits in the current window of one limit (sign-in per address, uploads per member…). Kept in
 * the database rather than in process memory so that every API instance counts against the same total.
 */
@Entity({ name: 'rate_limit_counters' })
@Index('rate_limit_counters_reset_idx', ['resetAt'])
export class RateLimitCounter {
  @PrimaryColumn({ type: 'text', primaryKeyConstraintName: 'rate_limit_counters_pkey' }) key!: string;
  @Column({ type: 'integer' }) hits!: number;
  @Column({ name: 'reset_at', type: 'timestamptz' }) resetAt!: Date;
}
