import { Check, Column, Entity, PrimaryGeneratedColumn } from 'typeorm';
import { CreatedAt, UpdatedAt } from './columns';

export type ShopTemperatureProfile =
  { mode: 'plan' } | { mode: 'day_night'; dayTempC: number; nightTempC: number; dayStartHour: number; nightStartHour: number } | { mode: 'learned' };

@Entity({ name: 'shops' })
@Check('shops_unit_system_check', `unit_system IN ('metric', 'us')`)
@Check('shops_scale_resolution_check', `scale_resolution_g IN (0.1, 1)`)
@Check('shops_day_start_hour_check', `day_start_hour >= 0 AND day_start_hour <= 23`)
@Check('shops_quiet_from_hour_check', `quiet_from_hour >= 0 AND quiet_from_hour <= 23`)
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
  /** IANA zone the shop lives in: every time shown or mailed is in it. */
  @Column({ name: 'time_zone', type: 'text', default: 'UTC' }) timeZone!: string;
  /**
   * The shop's temperature where nothing is logged: the plan's shop temperature, day and night at local hours, or
   * learned from the last week of readings.
   */
  @Column({ name: 'temperature_profile', type: 'jsonb', default: () => `'{"mode":"plan"}'::jsonb` }) temperatureProfile!: ShopTemperatureProfile;
  /** Local hour the working day starts: the morning digest goes out then, and quiet hours end. */
  @Column({ name: 'day_start_hour', type: 'integer', default: 7 }) dayStartHour!: number;
  /** Local hour quiet hours start: reminders falling after it wait for the morning digest. */
  @Column({ name: 'quiet_from_hour', type: 'integer', default: 21 }) quietFromHour!: number;
  /** The shop's local date of the last morning digest sent, so each day has one (null before the first). */
  @Column({ name: 'digest_on', type: 'date', nullable: true }) digestOn!: string | null;
  /** ISO 4217 code every cost of the shop is in; the API checks it against the codes the runtime knows. */
  @Column({ type: 'text', default: 'USD' }) currency!: string;
  /** sha256 of the token a shop thermometer sends with its readings. */
  @Column({ name: 'ingest_token_hash', type: 'text', nullable: true, select: false }) ingestTokenHash!: string | null;
  @CreatedAt() createdAt!: Date;
  @UpdatedAt() updatedAt!: Date;
}
