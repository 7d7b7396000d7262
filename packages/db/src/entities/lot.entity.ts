import { Check, Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { CreatedAt, UpdatedAt } from './columns';
import { Pigment } from './pigment.entity';
import { ResinSystem } from './resin-system.entity';
import { Shop } from './shop.entity';

export type LotPart = 'A' | 'B' | 'pigment';

/** A received container of part A, part B or a pigment: traced into batches, drawn down by them. */
@Entity({ name: 'lots' })
@Check('lots_part_check', `part IN ('A', 'B', 'pigment')`)
@Check(
  'lots_product_check',
  `(part = 'pigment' AND pigment_id IS NOT NULL AND resin_system_id IS NULL) OR (part IN ('A', 'B') AND resin_system_id IS NOT NULL AND pigment_id IS NULL)`,
)
@Check('lots_quantity_check', `quantity_g > 0`)
@Index('lots_shop_expires_idx', ['shopId', 'expiresOn'])
@Index('lots_shop_number_idx', ['shopId', 'lotNumber'])
export class Lot {
  @PrimaryGeneratedColumn('uuid', { primaryKeyConstraintName: 'lots_pkey' }) id!: string;
  @Column({ name: 'shop_id', type: 'uuid' }) shopId!: string;
  @Column({ type: 'text' }) part!: LotPart;
  @Column({ name: 'resin_system_id', type: 'uuid', nullable: true }) resinSystemId!: string | null;
  @Column({ name: 'pigment_id', type: 'uuid', nullable: true }) pigmentId!: string | null;
  @Column({ name: 'lot_number', type: 'text' }) lotNumber!: string;
  @Column({ name: 'quantity_g', type: 'double precision' }) quantityG!: number;
  @Column({ name: 'remaining_g', type: 'double precision' }) remainingG!: number;
  @Column({ name: 'received_on', type: 'date' }) receivedOn!: string;
  @Column({ name: 'expires_on', type: 'date', nullable: true }) expiresOn!: string | null;
  @Column({ type: 'text', default: '' }) notes!: string;
  @ManyToOne(() => Shop, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'shop_id', foreignKeyConstraintName: 'lots_shop_fk' })
  shop?: Shop;
  @ManyToOne(() => ResinSystem, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'resin_system_id', foreignKeyConstraintName: 'lots_resin_system_fk' })
  resinSystem?: ResinSystem | null;
  @ManyToOne(() => Pigment, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'pigment_id', foreignKeyConstraintName: 'lots_pigment_fk' })
  pigment?: Pigment | null;
  @CreatedAt() createdAt!: Date;
  @UpdatedAt() updatedAt!: Date;
}
