import { Check, Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { CreatedAt, UpdatedAt } from './columns';
import { Shop } from './shop.entity';

export type ResinUse = 'seal' | 'deep_pour' | 'casting' | 'coating';

/** A resin system on the shelf, as entered from its data sheet; times at referenceTempC. */
@Entity({ name: 'resin_systems' })
@Check('resin_systems_use_check', `use IN ('seal', 'deep_pour', 'casting', 'coating')`)
@Check('resin_systems_ratio_basis_check', `ratio_basis IN ('weight', 'volume')`)
@Check(
  'resin_systems_exotherm_check',
  `(reaction_heat_j_per_g IS NULL OR reaction_heat_j_per_g > 0) AND (thin_film_gel_min IS NULL OR thin_film_gel_min > 0) AND (heat_capacity_j_per_gk IS NULL OR heat_capacity_j_per_gk > 0) AND (conductivity_w_per_mk IS NULL OR conductivity_w_per_mk > 0) AND (accepted_peak_c IS NULL OR accepted_peak_c > reference_temp_c)`,
)
@Index('resin_systems_shop_name_idx', ['shopId', 'name'])
export class ResinSystem {
  @PrimaryGeneratedColumn('uuid', { primaryKeyConstraintName: 'resin_systems_pkey' }) id!: string;
  @Column({ name: 'shop_id', type: 'uuid' }) shopId!: string;
  @Column({ type: 'text' }) name!: string;
  @Column({ type: 'text', default: '' }) maker!: string;
  @Column({ type: 'text' }) use!: ResinUse;
  @Column({ name: 'ratio_a', type: 'double precision' }) ratioA!: number;
  @Column({ name: 'ratio_b', type: 'double precision' }) ratioB!: number;
  @Column({ name: 'ratio_basis', type: 'text' }) ratioBasis!: 'weight' | 'volume';
  @Column({ name: 'density_a_g_per_ml', type: 'double precision' }) densityAGPerMl!: number;
  @Column({ name: 'density_b_g_per_ml', type: 'double precision' }) densityBGPerMl!: number;
  @Column({ name: 'pot_life_min', type: 'double precision' }) potLifeMin!: number;
  @Column({ name: 'gel_time_h', type: 'double precision' }) gelTimeH!: number;
  @Column({ name: 'tack_free_h', type: 'double precision' }) tackFreeH!: number;
  @Column({ name: 'recoat_earliest_h', type: 'double precision' }) recoatEarliestH!: number;
  @Column({ name: 'recoat_latest_h', type: 'double precision' }) recoatLatestH!: number;
  @Column({ name: 'demold_h', type: 'double precision' }) demoldH!: number;
  @Column({ name: 'full_cure_h', type: 'double precision' }) fullCureH!: number;
  @Column({ name: 'ready_to_machine_h', type: 'double precision', nullable: true }) readyToMachineH!: number | null;
  @Column({ name: 'reference_temp_c', type: 'double precision' }) referenceTempC!: number;
  @Column({ name: 'min_work_temp_c', type: 'double precision' }) minWorkTempC!: number;
  @Column({ name: 'max_work_temp_c', type: 'double precision' }) maxWorkTempC!: number;
  @Column({ name: 'max_layer_mm', type: 'double precision' }) maxLayerMm!: number;
  @Column({ name: 'max_batch_g', type: 'double precision' }) maxBatchG!: number;
  @Column({ name: 'activation_energy_kj_per_mol', type: 'double precision', nullable: true }) activationEnergyKJPerMol!: number | null;
  /** Shore D of the cured product when the data sheet states it: release then needs a check that reached it. */
  @Column({ name: 'hardness_shore_d', type: 'double precision', nullable: true }) hardnessShoreD!: number | null;
  /** Exotherm forecast settings; null takes the default core's exothermSettingsOf names. */
  @Column({ name: 'reaction_heat_j_per_g', type: 'double precision', nullable: true }) reactionHeatJPerG!: number | null;
  @Column({ name: 'thin_film_gel_min', type: 'double precision', nullable: true }) thinFilmGelMin!: number | null;
  @Column({ name: 'heat_capacity_j_per_gk', type: 'double precision', nullable: true }) heatCapacityJPerGK!: number | null;
  @Column({ name: 'conductivity_w_per_mk', type: 'double precision', nullable: true }) conductivityWPerMK!: number | null;
  @Column({ name: 'accepted_peak_c', type: 'double precision', nullable: true }) acceptedPeakC!: number | null;
  @Column({ name: 'price_per_kit', type: 'double precision' }) pricePerKit!: number;
  @Column({ name: 'kit_size_g', type: 'double precision' }) kitSizeG!: number;
  @Column({ name: 'shelf_life_months', type: 'double precision' }) shelfLifeMonths!: number;
  @Column({ name: 'archived_at', type: 'timestamptz', nullable: true }) archivedAt!: Date | null;
  @ManyToOne(() => Shop, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'shop_id', foreignKeyConstraintName: 'resin_systems_shop_fk' })
  shop?: Shop;
  @CreatedAt() createdAt!: Date;
  @UpdatedAt() updatedAt!: Date;
}
