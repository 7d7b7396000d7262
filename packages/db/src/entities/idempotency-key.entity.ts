import { Check, Column, Entity, Index, JoinColumn, ManyToOne, PrimaryColumn } from 'typeorm';
import { Shop } from './shop.entity';
import { User } from './user.entity';

/**
 * The answer to a create that came with an Idempotency-Key header, kept per member so that a phone sending the same
 * entry again (its answer was lost on a weak connection) gets the first answer instead of a second record. A row
 * without a status is a claim: the first request is still running. Kept in the database so every API instance sees
 * the same claims.
 */
@Entity({ name: 'idempotency_keys' })
@Index('idempotency_keys_created_idx', ['createdAt'])
@Check('idempotency_keys_key_check', `char_length(key) BETWEEN 1 AND 255`)
export class IdempotencyKey {
  @PrimaryColumn({ name: 'shop_id', type: 'uuid', primaryKeyConstraintName: 'idempotency_keys_pkey' }) shopId!: string;
  @PrimaryColumn({ name: 'user_id', type: 'uuid', primaryKeyConstraintName: 'idempotency_keys_pkey' }) userId!: string;
  @PrimaryColumn({ type: 'text', primaryKeyConstraintName: 'idempotency_keys_pkey' }) key!: string;
  /** Method and route pattern, e.g. `POST /api/pours/:id/batches`. */
  @Column({ type: 'text' }) route!: string;
  /** SHA-256 of the request's parameters and body (and uploaded file), to tell a replay from a different request. */
  @Column({ type: 'text' }) fingerprint!: string;
  @Column({ name: 'status_code', type: 'integer', nullable: true }) statusCode!: number | null;
  // json, not jsonb: a replay sends the body back with its keys in the order the first answer had them.
  @Column({ name: 'response_body', type: 'json', nullable: true }) responseBody!: unknown;
  @Column({ name: 'created_at', type: 'timestamptz', default: () => 'now()' }) createdAt!: Date;
  @Column({ name: 'completed_at', type: 'timestamptz', nullable: true }) completedAt!: Date | null;
  @ManyToOne(() => User, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'user_id', foreignKeyConstraintName: 'idempotency_keys_user_fk' })
  user?: User;
  @ManyToOne(() => Shop, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'shop_id', foreignKeyConstraintName: 'idempotency_keys_shop_fk' })
  shop?: Shop;
}
