import { Check, Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { CreatedAt } from './columns';
import { Pour } from './pour.entity';

@Entity({ name: 'temperature_readings' })
@Check('temperature_readings_source_check', `source IN ('manual', 'csv', 'sensor')`)
// One live reading per moment; voided ones stay beside it as history.
@Index('temperature_readings_pour_time_key', ['pourId', 'takenAt'], { unique: true, where: 'voided_at IS NULL' })
export class TemperatureReading {
  @PrimaryGeneratedColumn('uuid', { primaryKeyConstraintName: 'temperature_readings_pkey' }) id!: string;
  @Column({ name: 'shop_id', type: 'uuid' }) shopId!: string;
  @Column({ name: 'pour_id', type: 'uuid' }) pourId!: string;
  @Column({ name: 'taken_at', type: 'timestamptz' }) takenAt!: Date;
  @Column({ name: 'temp_c', type: 'double precision' }) tempC!: number;
  @Column({ type: 'text' }) source!: 'manual' | 'csv' | 'sensor';
  /** Who logged it by hand or from a file; null for the shop thermometer. */
  @Column({ name: 'logged_by_id', type: 'uuid', nullable: true }) loggedById!: string | null;
  /** A void keeps the reading in the history but out of the cure. */
  @Column({ name: 'voided_at', type: 'timestamptz', nullable: true }) voidedAt!: Date | null;
  @Column({ name: 'voided_by_id', type: 'uuid', nullable: true }) voidedById!: string | null;
  @Column({ name: 'void_reason', type: 'text', nullable: true }) voidReason!: string | null;
  @ManyToOne(() => Pour, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'pour_id', foreignKeyConstraintName: 'temperature_readings_pour_fk' })
  pour?: Pour;
  @CreatedAt() createdAt!: Date;
}
