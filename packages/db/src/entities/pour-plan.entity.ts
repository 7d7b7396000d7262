import type { PourPlanInput, StoredPlanProductSnapshot, StoredPourPlanResult } from '@gelpoint/contracts';
import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { CreatedAt, UpdatedAt } from './columns';
import { Mold } from './mold.entity';
import { Piece } from './piece.entity';
import { Shop } from './shop.entity';
import { User } from './user.entity';

/**
 * A saved pour plan: the maker's inputs, a snapshot of the shelf values it used (a later edit of the
 * shelf does not rewrite it) and the result the server computed from both. The jsonb columns are typed as what a row
 * of any version may hold (the schemas' input types); a reader parses them with the schema (PourPlanResult,
 * PlanProductSnapshot) to get today's shape.
 */
@Entity({ name: 'pour_plans' })
@Index('pour_plans_shop_piece_idx', ['shopId', 'pieceId'])
export class PourPlan {
  @PrimaryGeneratedColumn('uuid', { primaryKeyConstraintName: 'pour_plans_pkey' }) id!: string;
  @Column({ name: 'shop_id', type: 'uuid' }) shopId!: string;
  @Column({ name: 'piece_id', type: 'uuid' }) pieceId!: string;
  @Column({ name: 'mold_id', type: 'uuid', nullable: true }) moldId!: string | null;
  @Column({ type: 'text' }) name!: string;
  // Inputs saved before levelFrom existed lack it; the API's storedInputs reads them in today's terms.
  @Column({ type: 'jsonb' }) inputs!: PourPlanInput;
  @Column({ name: 'product_snapshot', type: 'jsonb' }) productSnapshot!: StoredPlanProductSnapshot;
  @Column({ type: 'jsonb' }) result!: StoredPourPlanResult;
  @Column({ name: 'created_by_id', type: 'uuid', nullable: true }) createdById!: string | null;
  @ManyToOne(() => Shop, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'shop_id', foreignKeyConstraintName: 'pour_plans_shop_fk' })
  shop?: Shop;
  @ManyToOne(() => Piece, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'piece_id', foreignKeyConstraintName: 'pour_plans_piece_fk' })
  piece?: Piece;
  // A mould a plan uses is not deleted from under it (the API refuses and names the plans); checked at the end of
  // the statement, so deleting a whole shop, moulds and plans together, still cascades.
  @ManyToOne(() => Mold, { onDelete: 'NO ACTION' })
  @JoinColumn({ name: 'mold_id', foreignKeyConstraintName: 'pour_plans_mold_fk' })
  mold?: Mold | null;
  @ManyToOne(() => User, { onDelete: 'SET NULL' })
  @JoinColumn({ name: 'created_by_id', foreignKeyConstraintName: 'pour_plans_created_by_fk' })
  createdBy?: User | null;
  @CreatedAt() createdAt!: Date;
  @UpdatedAt() updatedAt!: Date;
}
