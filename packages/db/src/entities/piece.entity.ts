import { Check, Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { CreatedAt, UpdatedAt } from './columns';
import { Shop } from './shop.entity';
import { User } from './user.entity';

export type PieceStage = 'planning' | 'pouring' | 'curing' | 'ready' | 'released' | 'finishing' | 'done';

@Entity({ name: 'pieces' })
@Check('pieces_stage_check', `stage IN ('planning', 'pouring', 'curing', 'ready', 'released', 'finishing', 'done')`)
@Index('pieces_shop_updated_idx', ['shopId', 'updatedAt'])
export class Piece {
  @PrimaryGeneratedColumn('uuid', { primaryKeyConstraintName: 'pieces_pkey' }) id!: string;
  @Column({ name: 'shop_id', type: 'uuid' }) shopId!: string;
  @Column({ type: 'text' }) name!: string;
  @Column({ type: 'text', default: '' }) wood!: string;
  @Column({ type: 'text', default: '' }) notes!: string;
  @Column({ type: 'text', default: 'planning' }) stage!: PieceStage;
  @Column({ name: 'created_by_id', type: 'uuid', nullable: true }) createdById!: string | null;
  @ManyToOne(() => Shop, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'shop_id', foreignKeyConstraintName: 'pieces_shop_fk' })
  shop?: Shop;
  @ManyToOne(() => User, { onDelete: 'SET NULL' })
  @JoinColumn({ name: 'created_by_id', foreignKeyConstraintName: 'pieces_created_by_fk' })
  createdBy?: User | null;
  @CreatedAt() createdAt!: Date;
  @UpdatedAt() updatedAt!: Date;
}
