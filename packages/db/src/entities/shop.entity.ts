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
  @CreatedAt() createdAt!: Date;
  @UpdatedAt() updatedAt!: Date;
}
