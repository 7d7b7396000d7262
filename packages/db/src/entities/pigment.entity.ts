import { Check, Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { CreatedAt, UpdatedAt } from './columns';
import { Shop } from './shop.entity';

@Entity({ name: 'pigments' })
@Check('pigments_kind_check', `kind IN ('powder', 'paste', 'liquid')`)
@Index('pigments_shop_name_idx', ['shopId', 'name'])
export class Pigment {
  @PrimaryGeneratedColumn('uuid', { primaryKeyConstraintName: 'pigments_pkey' }) id!: string;
  @Column({ name: 'shop_id', type: 'uuid' }) shopId!: string;
  @Column({ type: 'text' }) name!: string;
  @Column({ type: 'text' }) kind!: 'powder' | 'paste' | 'liquid';
  /** g/mL: its volume counts in the pour. */
  @Column({ name: 'density_g_per_ml', type: 'double precision' }) densityGPerMl!: number;
  @Column({ name: 'recommended_pct', type: 'double precision' }) recommendedPct!: number;
  @Column({ name: 'max_pct', type: 'double precision' }) maxPct!: number;
  @Column({ name: 'price_per_pack', type: 'double precision' }) pricePerPack!: number;
  @Column({ name: 'pack_size_g', type: 'double precision' }) packSizeG!: number;
  @Column({ name: 'archived_at', type: 'timestamptz', nullable: true }) archivedAt!: Date | null;
  @ManyToOne(() => Shop, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'shop_id', foreignKeyConstraintName: 'pigments_shop_fk' })
  shop?: Shop;
  @CreatedAt() createdAt!: Date;
  @UpdatedAt() updatedAt!: Date;
}
