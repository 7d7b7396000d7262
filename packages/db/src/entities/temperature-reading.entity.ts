import { Check, Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { CreatedAt } from './columns';
import { Pour } from './pour.entity';

@Entity({ name: 'temperature_readings' })
@Check('temperature_readings_source_check', `source IN ('manual', 'csv', 'sensor')`)
@Index('temperature_readings_pour_time_key', ['pourId', 'takenAt'], { unique: true })
export class TemperatureReading {
  @PrimaryGeneratedColumn('uuid', { primaryKeyConstraintName: 'temperature_readings_pkey' }) id!: string;
  @Column({ name: 'shop_id', type: 'uuid' }) shopId!: string;
  @Column({ name: 'pour_id', type: 'uuid' }) pourId!: string;
  @Column({ name: 'taken_at', type: 'timestamptz' }) takenAt!: Date;
  @Column({ name: 'temp_c', type: 'double precision' }) tempC!: number;
  @Column({ type: 'text' }) source!: 'manual' | 'csv' | 'sensor';
  @ManyToOne(() => Pour, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'pour_id', foreignKeyConstraintName: 'temperature_readings_pour_fk' })
  pour?: Pour;
  @CreatedAt() createdAt!: Date;
}
