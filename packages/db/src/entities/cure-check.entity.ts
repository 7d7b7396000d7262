import { Check, Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { CreatedAt } from './columns';
import { Pour } from './pour.entity';
import { User } from './user.entity';

export type CureCheckStage = 'liquid' | 'gelled' | 'tack_free' | 'demoldable' | 'machinable';

@Entity({ name: 'cure_checks' })
@Check('cure_checks_stage_check', `stage IN ('liquid', 'gelled', 'tack_free', 'demoldable', 'machinable')`)
@Index('cure_checks_pour_idx', ['pourId', 'checkedAt'])
export class CureCheck {
  @PrimaryGeneratedColumn('uuid', { primaryKeyConstraintName: 'cure_checks_pkey' }) id!: string;
  @Column({ name: 'shop_id', type: 'uuid' }) shopId!: string;
  @Column({ name: 'pour_id', type: 'uuid' }) pourId!: string;
  @Column({ name: 'checked_at', type: 'timestamptz' }) checkedAt!: Date;
  @Column({ type: 'text' }) stage!: CureCheckStage;
  /** Shore D, when a durometer was used. */
  @Column({ name: 'hardness_shore_d', type: 'double precision', nullable: true }) hardnessShoreD!: number | null;
  @Column({ type: 'text', default: '' }) note!: string;
  @Column({ name: 'photo_type', type: 'text', nullable: true }) photoType!: string | null;
  @Column({ name: 'photo', type: 'bytea', nullable: true, select: false }) photo!: Buffer | null;
  @Column({ name: 'checked_by_id', type: 'uuid', nullable: true }) checkedById!: string | null;
  @ManyToOne(() => Pour, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'pour_id', foreignKeyConstraintName: 'cure_checks_pour_fk' })
  pour?: Pour;
  @ManyToOne(() => User, { onDelete: 'SET NULL' })
  @JoinColumn({ name: 'checked_by_id', foreignKeyConstraintName: 'cure_checks_checked_by_fk' })
  checkedBy?: User | null;
  @CreatedAt() createdAt!: Date;
}
