import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { CreatedAt } from './columns';
import { Shop } from './shop.entity';
import { User } from './user.entity';

/** One signed-in device. The token names its row, so signing out or disabling a member ends it at once. */
@Entity({ name: 'sessions' })
@Index('sessions_user_idx', ['userId'])
export class Session {
  @PrimaryGeneratedColumn('uuid', { primaryKeyConstraintName: 'sessions_pkey' }) id!: string;
  @Column({ name: 'user_id', type: 'uuid' }) userId!: string;
  @Column({ name: 'shop_id', type: 'uuid' }) shopId!: string;
  @Column({ name: 'expires_at', type: 'timestamptz' }) expiresAt!: Date;
  @Column({ name: 'revoked_at', type: 'timestamptz', nullable: true }) revokedAt!: Date | null;
  @Column({ name: 'user_agent', type: 'text', default: '' }) userAgent!: string;
  @ManyToOne(() => User, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'user_id', foreignKeyConstraintName: 'sessions_user_fk' })
  user?: User;
  @ManyToOne(() => Shop, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'shop_id', foreignKeyConstraintName: 'sessions_shop_fk' })
  shop?: Shop;
  @CreatedAt() createdAt!: Date;
}
