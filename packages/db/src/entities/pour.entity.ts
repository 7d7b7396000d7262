import { Check, Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { CreatedAt, UpdatedAt } from './columns';
import { Piece } from './piece.entity';
import { PourPlan } from './pour-plan.entity';
import { Shop } from './shop.entity';
import { User } from './user.entity';

export type PourStatus = 'open' | 'released' | 'machined' | 'cancelled';

/** A plan being poured: its batches, readings and checks hang off it; the cure clock runs from its steps. */
@Entity({ name: 'pours' })
@Check('pours_status_check', `status IN ('open', 'released', 'machined', 'cancelled')`)
@Index('pours_shop_status_idx', ['shopId', 'status'])
export class Pour {
  @PrimaryGeneratedColumn('uuid', { primaryKeyConstraintName: 'pours_pkey' }) id!: string;
  @Column({ name: 'shop_id', type: 'uuid' }) shopId!: string;
  @Column({ name: 'piece_id', type: 'uuid' }) pieceId!: string;
  @Column({ name: 'pour_plan_id', type: 'uuid' }) pourPlanId!: string;
  @Column({ type: 'text', default: 'open' }) status!: PourStatus;
  /** The plan's shop temperature: the cure model's assumption wherever no reading exists. */
  @Column({ name: 'assumed_temp_c', type: 'double precision' }) assumedTempC!: number;
  /** Who gets the reminders. */
  @Column({ name: 'notify_user_ids', type: 'uuid', array: true, default: () => "'{}'" }) notifyUserIds!: string[];
  @Column({ name: 'started_by_id', type: 'uuid', nullable: true }) startedById!: string | null;
  @Column({ name: 'released_at', type: 'timestamptz', nullable: true }) releasedAt!: Date | null;
  @Column({ name: 'released_by_id', type: 'uuid', nullable: true }) releasedById!: string | null;
  @Column({ name: 'machined_at', type: 'timestamptz', nullable: true }) machinedAt!: Date | null;
  @Column({ name: 'finish_coats', type: 'integer', nullable: true }) finishCoats!: number | null;
  @Column({ name: 'finish_coat_interval_h', type: 'double precision', nullable: true }) finishCoatIntervalH!: number | null;
  @ManyToOne(() => Shop, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'shop_id', foreignKeyConstraintName: 'pours_shop_fk' })
  shop?: Shop;
  @ManyToOne(() => Piece, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'piece_id', foreignKeyConstraintName: 'pours_piece_fk' })
  piece?: Piece;
  @ManyToOne(() => PourPlan, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'pour_plan_id', foreignKeyConstraintName: 'pours_pour_plan_fk' })
  pourPlan?: PourPlan;
  @ManyToOne(() => User, { onDelete: 'SET NULL' })
  @JoinColumn({ name: 'started_by_id', foreignKeyConstraintName: 'pours_started_by_fk' })
  startedBy?: User | null;
  @ManyToOne(() => User, { onDelete: 'SET NULL' })
  @JoinColumn({ name: 'released_by_id', foreignKeyConstraintName: 'pours_released_by_fk' })
  releasedBy?: User | null;
  @CreatedAt() createdAt!: Date;
  @UpdatedAt() updatedAt!: Date;
}
