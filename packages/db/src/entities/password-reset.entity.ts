import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { CreatedAt } from './columns';
import { User } from './user.entity';

@Entity({ name: 'password_resets' })
@Index('password_resets_token_hash_key', ['tokenHash'], { unique: true })
@Index('password_resets_user_idx', ['userId'])
export class PasswordReset {
  @PrimaryGeneratedColumn('uuid', { primaryKeyConstraintName: 'password_resets_pkey' }) id!: string;
  @Column({ name: 'user_id', type: 'uuid' }) userId!: string;
  @Column({ name: 'token_hash', type: 'text' }) tokenHash!: string;
  @Column({ name: 'expires_at', type: 'timestamptz' }) expiresAt!: Date;
  @Column({ name: 'used_at', type: 'timestamptz', nullable: true }) usedAt!: Date | null;
  @ManyToOne(() => User, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'user_id', foreignKeyConstraintName: 'password_resets_user_fk' })
  user?: User;
  @CreatedAt() createdAt!: Date;
}
