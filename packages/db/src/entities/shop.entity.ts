import { Check, Column, Entity, PrimaryGeneratedColumn } from 'typeorm';
import { CreatedAt, UpdatedAt } from './columns';

@Entity({ name: 'shops' })
@Check('shops_unit_system_check', `unit_system IN ('metric', 'us')`)
@Check('shops_scale_resolution_check', `scale_resolution_g IN (0.1, 1)`)
@Check('shops_reading_carry_check', `reading_carry_h >= 0 AND reading_carry_h <= 48`)
@Check('shops_window_close_lead_check', `window_close_lead_min >= 0 AND window_close_lead_min <= 720`)
@Check('shops_currency_check', `currency ~ '^[A-Z]{3}$'`)
export class Shop {
  @PrimaryGeneratedColumn('uuid', { primaryKeyConstraintName: 'shops_pkey' }) id!: string;
  @Column({ type: 'text' }) name!: string;
  @Column({ name: 'unit_system', type: 'text', default: 'metric' }) unitSystem!: 'metric' | 'us';
  @Column({ name: 'scale_resolution_g', type: 'double precision', default: 0.1 }) scaleResolutionG!: number;
  /** Weighed A:B may differ from the target by this much before the batch is flagged off-ratio. */
  @Column({ name: 'off_ratio_tolerance_pct', type: 'double precision', default: 3 }) offRatioTolerancePct!: number;
  /** How long one temperature reading speaks for on either side of it in the cure sum; beyond, the log has a gap. */
  @Column({ name: 'reading_carry_h', type: 'double precision', default: 2 }) readingCarryH!: number;
  /** Closing pour windows are announced this many minutes before they close. */
  @Column({ name: 'window_close_lead_min', type: 'integer', default: 30 }) windowCloseLeadMin!: number;
  /** ISO 4217 code every cost of the shop is in; the API checks it against the codes the runtime knows. */
  @Column({ type: 'text', default: 'USD' }) currency!: string;
  /** sha256 of the token a shop thermometer sends with its readings. */
  @Column({ name: 'ingest_token_hash', type: 'text', nullable: true, select: false }) ingestTokenHash!: string | null;
  @CreatedAt() createdAt!: Date;
  @UpdatedAt() updatedAt!: Date;
}
