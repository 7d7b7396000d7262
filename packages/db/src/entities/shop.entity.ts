import { Check, Column, Entity, PrimaryGeneratedColumn } from 'typeorm';
import { CreatedAt, UpdatedAt } from './columns';

@Entity({ name: 'shops' })
@Check('shops_unit_system_check', `unit_system IN ('metric', 'us')`)
@Check('shops_scale_resolution_check', `scale_resolution_g IN (0.1, 1)`)
export class Shop {
  @PrimaryGeneratedColumn('uuid', { primaryKeyConstraintName: 'shops_pkey' }) id!: string;
  @Column({ type: 'text' }) name!: string;
  @Column({ name: 'unit_system', type: 'text', default: 'metric' }) unitSystem!: 'metric' | 'us';
  @Column({ name: 'scale_resolution_g', type: 'double precision', default: 0.1 }) scaleResolutionG!: number;
  /** Weighed A:B may differ from the target by this much before the batch is flagged off-ratio. */
  @Column({ name: 'off_ratio_tolerance_pct', type: 'double precision', default: 3 }) offRatioTolerancePct!: number;
  /** sha256 of the token a shop thermometer sends with its readings. */
  @Column({ name: 'ingest_token_hash', type: 'text', nullable: true, select: false }) ingestTokenHash!: string | null;
  @CreatedAt() createdAt!: Date;
  @UpdatedAt() updatedAt!: Date;
}
