import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { CreatedAt } from './columns';
import { Lot } from './lot.entity';
import { Pour } from './pour.entity';
import { User } from './user.entity';

/** One cup as mixed: what went in (lots, grams), who mixed it, and the air and surface it met. */
@Entity({ name: 'pour_batches' })
@Index('pour_batches_pour_idx', ['pourId', 'mixedAt'])
// One live cup per run-sheet place; a voided cup stays beside its re-logged one as history.
@Index('pour_batches_pour_index_key', ['pourId', 'planBatchIndex'], { unique: true, where: 'voided_at IS NULL' })
export class PourBatch {
  @PrimaryGeneratedColumn('uuid', { primaryKeyConstraintName: 'pour_batches_pkey' }) id!: string;
  @Column({ name: 'shop_id', type: 'uuid' }) shopId!: string;
  @Column({ name: 'pour_id', type: 'uuid' }) pourId!: string;
  /** The batch's place in the plan's run sheet (PlannedBatch.index). */
  @Column({ name: 'plan_batch_index', type: 'integer' }) planBatchIndex!: number;
  /** 'seal_coat:1', 'layer:2': the step of the plan this cup belongs to. */
  @Column({ type: 'text' }) step!: string;
  @Column({ name: 'mixed_by_id', type: 'uuid', nullable: true }) mixedById!: string | null;
  @Column({ name: 'mixed_at', type: 'timestamptz' }) mixedAt!: Date;
  @Column({ name: 'lot_a_id', type: 'uuid', nullable: true }) lotAId!: string | null;
  @Column({ name: 'lot_b_id', type: 'uuid', nullable: true }) lotBId!: string | null;
  @Column({ name: 'lot_pigment_id', type: 'uuid', nullable: true }) lotPigmentId!: string | null;
  @Column({ name: 'lot_a_number', type: 'text', default: '' }) lotANumber!: string;
  @Column({ name: 'lot_b_number', type: 'text', default: '' }) lotBNumber!: string;
  @Column({ name: 'lot_pigment_number', type: 'text', default: '' }) lotPigmentNumber!: string;
  @Column({ name: 'target_a_g', type: 'double precision' }) targetAG!: number;
  @Column({ name: 'target_b_g', type: 'double precision' }) targetBG!: number;
  @Column({ name: 'target_pigment_g', type: 'double precision', default: 0 }) targetPigmentG!: number;
  @Column({ name: 'weighed_a_g', type: 'double precision' }) weighedAG!: number;
  @Column({ name: 'weighed_b_g', type: 'double precision' }) weighedBG!: number;
  @Column({ name: 'weighed_pigment_g', type: 'double precision', default: 0 }) weighedPigmentG!: number;
  /** Weighed A:B against the target A:B, in percent (0 = on ratio). */
  @Column({ name: 'off_ratio_pct', type: 'double precision' }) offRatioPct!: number;
  @Column({ name: 'ambient_temp_c', type: 'double precision', nullable: true }) ambientTempC!: number | null;
  @Column({ name: 'surface_temp_c', type: 'double precision', nullable: true }) surfaceTempC!: number | null;
  @Column({ name: 'rh_pct', type: 'double precision', nullable: true }) rhPct!: number | null;
  @Column({ name: 'dew_point_c', type: 'double precision', nullable: true }) dewPointC!: number | null;
  @Column({ type: 'jsonb', default: () => "'[]'::jsonb" }) warnings!: { code: string; message: string }[];
  @Column({ type: 'text', default: '' }) notes!: string;
  /** A void keeps the cup in the history but out of the cure, and gives its grams back to the lots. */
  @Column({ name: 'voided_at', type: 'timestamptz', nullable: true }) voidedAt!: Date | null;
  @Column({ name: 'voided_by_id', type: 'uuid', nullable: true }) voidedById!: string | null;
  @Column({ name: 'void_reason', type: 'text', nullable: true }) voidReason!: string | null;
  @ManyToOne(() => Pour, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'pour_id', foreignKeyConstraintName: 'pour_batches_pour_fk' })
  pour?: Pour;
  @ManyToOne(() => User, { onDelete: 'SET NULL' })
  @JoinColumn({ name: 'mixed_by_id', foreignKeyConstraintName: 'pour_batches_mixed_by_fk' })
  mixedBy?: User | null;
  @ManyToOne(() => Lot, { onDelete: 'SET NULL' })
  @JoinColumn({ name: 'lot_a_id', foreignKeyConstraintName: 'pour_batches_lot_a_fk' })
  lotA?: Lot | null;
  @ManyToOne(() => Lot, { onDelete: 'SET NULL' })
  @JoinColumn({ name: 'lot_b_id', foreignKeyConstraintName: 'pour_batches_lot_b_fk' })
  lotB?: Lot | null;
  @ManyToOne(() => Lot, { onDelete: 'SET NULL' })
  @JoinColumn({ name: 'lot_pigment_id', foreignKeyConstraintName: 'pour_batches_lot_pigment_fk' })
  lotPigment?: Lot | null;
  @CreatedAt() createdAt!: Date;
}
