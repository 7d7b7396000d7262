import { Check, Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { CreatedAt, UpdatedAt } from './columns';
import { Piece } from './piece.entity';
import { Shop } from './shop.entity';
import { User } from './user.entity';

export type MoldStatus = 'queued' | 'analysing' | 'ready' | 'failed';
/** The units the file's numbers were read in; a 3MF may state um, m or ft besides mm, cm and in. */
export type MoldUnits = 'um' | 'mm' | 'cm' | 'm' | 'in' | 'ft';
export type MoldFormat = 'stl' | '3mf' | 'obj';
export type UpAxis = 'x' | 'y' | 'z';

/** An uploaded mould and its cavity analysis. The file's bytes (STL, 3MF or OBJ) live apart, in mold_files. */
@Entity({ name: 'molds' })
@Check('molds_status_check', `status IN ('queued', 'analysing', 'ready', 'failed')`)
@Check('molds_units_check', `units IN ('um', 'mm', 'cm', 'm', 'in', 'ft')`)
@Check('molds_file_units_check', `file_units IS NULL OR file_units IN ('um', 'mm', 'cm', 'm', 'in', 'ft')`)
@Check('molds_format_check', `format IN ('stl', '3mf', 'obj')`)
@Check('molds_up_axis_check', `up_axis IN ('x', 'y', 'z')`)
@Index('molds_shop_created_idx', ['shopId', 'createdAt'])
@Index('molds_due_idx', ['status', 'lockedUntil'])
export class Mold {
  @PrimaryGeneratedColumn('uuid', { primaryKeyConstraintName: 'molds_pkey' }) id!: string;
  @Column({ name: 'shop_id', type: 'uuid' }) shopId!: string;
  @Column({ name: 'piece_id', type: 'uuid', nullable: true }) pieceId!: string | null;
  @Column({ type: 'text' }) name!: string;
  @Column({ name: 'file_name', type: 'text' }) fileName!: string;
  @Column({ type: 'text', default: 'stl' }) format!: MoldFormat;
  @Column({ type: 'text' }) units!: MoldUnits;
  /** The unit the file itself states (3MF); null for formats that carry none. */
  @Column({ name: 'file_units', type: 'text', nullable: true }) fileUnits!: MoldUnits | null;
  @Column({ name: 'up_axis', type: 'text' }) upAxis!: UpAxis;
  @Column({ name: 'size_bytes', type: 'integer' }) sizeBytes!: number;
  @Column({ type: 'text' }) sha256!: string;
  @Column({ type: 'text', default: 'queued' }) status!: MoldStatus;
  /** 0..1 while analysing. */
  @Column({ type: 'double precision', default: 0 }) progress!: number;
  @Column({ type: 'integer', default: 0 }) attempts!: number;
  @Column({ name: 'locked_until', type: 'timestamptz', nullable: true }) lockedUntil!: Date | null;
  @Column({ name: 'error_code', type: 'text', nullable: true }) errorCode!: string | null;
  @Column({ name: 'error_message', type: 'text', nullable: true }) errorMessage!: string | null;
  @Column({ name: 'triangle_count', type: 'integer', nullable: true }) triangleCount!: number | null;
  /** The report shown to people (summary, warnings, curve, the fill to the top); its depth map is kept apart. */
  @Column({ type: 'jsonb', nullable: true }) report!: Record<string, unknown> | null;
  /**
   * The depth map of the report's fill to the top: the largest part of the report, which only the depth map and 3D
   * views draw, so the mould's own answer and the lists never carry it.
   */
  @Column({ name: 'depth_map', type: 'jsonb', nullable: true }) depthMap!: Record<string, unknown> | null;
  /** What the engine needs to answer a fill at any level without the mesh. */
  @Column({ type: 'jsonb', nullable: true }) analysis!: Record<string, unknown> | null;
  @Column({ name: 'analysed_at', type: 'timestamptz', nullable: true }) analysedAt!: Date | null;
  @Column({ name: 'created_by_id', type: 'uuid', nullable: true }) createdById!: string | null;
  @ManyToOne(() => Shop, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'shop_id', foreignKeyConstraintName: 'molds_shop_fk' })
  shop?: Shop;
  @ManyToOne(() => Piece, { onDelete: 'SET NULL' })
  @JoinColumn({ name: 'piece_id', foreignKeyConstraintName: 'molds_piece_fk' })
  piece?: Piece | null;
  @ManyToOne(() => User, { onDelete: 'SET NULL' })
  @JoinColumn({ name: 'created_by_id', foreignKeyConstraintName: 'molds_created_by_fk' })
  createdBy?: User | null;
  @CreatedAt() createdAt!: Date;
  @UpdatedAt() updatedAt!: Date;
}
