import { Column, Entity, JoinColumn, OneToOne, PrimaryColumn } from 'typeorm';
import { Mold } from './mold.entity';

/** The uploaded STL, in the database so every API and worker replica sees the same bytes. */
@Entity({ name: 'mold_files' })
export class MoldFile {
  @PrimaryColumn({ name: 'mold_id', type: 'uuid', primaryKeyConstraintName: 'mold_files_pkey' }) moldId!: string;
  @Column({ type: 'bytea' }) bytes!: Buffer;
  @OneToOne(() => Mold, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'mold_id', foreignKeyConstraintName: 'mold_files_mold_fk' })
  mold?: Mold;
}
