import { Check, Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { CreatedAt, UpdatedAt } from './columns';
import { Shop } from './shop.entity';
import { User } from './user.entity';

export type Role = 'lead' | 'maker' | 'apprentice';

@Entity({ name: 'memberships' })
@Index('memberships_calendar_token_key', ['calendarTokenHash'], { unique: true })
@Check('memberships_role_check', `role IN ('lead', 'maker', 'apprentice')`)
@Check('memberships_status_check', `status IN ('active', 'disabled')`)
@Index('memberships_user_shop_key', ['userId', 'shopId'], { unique: true })
@Index('memberships_shop_idx', ['shopId'])
export class Membership {
  @PrimaryGeneratedColumn('uuid', { primaryKeyConstraintName: 'memberships_pkey' }) id!: string;
  @Column({ name: 'user_id', type: 'uuid' }) userId!: string;
  @Column({ name: 'shop_id', type: 'uuid' }) shopId!: string;
  @Column({ type: 'text' }) role!: Role;
  @Column({ type: 'text', default: 'active' }) status!: 'active' | 'disabled';
  /**
   * The member's private calendar feed: its token is an HMAC of this random salt under the server's secret, so the
   * URL can be shown again without being stored; the feed is found by the token's sha256. A new salt revokes the old URL.
   */
  @Column({ name: 'calendar_token_salt', type: 'text', nullable: true, select: false }) calendarTokenSalt!: string | null;
  @Column({ name: 'calendar_token_hash', type: 'text', nullable: true, select: false }) calendarTokenHash!: string | null;
  @ManyToOne(() => User, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'user_id', foreignKeyConstraintName: 'memberships_user_fk' })
  user?: User;
  @ManyToOne(() => Shop, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'shop_id', foreignKeyConstraintName: 'memberships_shop_fk' })
  shop?: Shop;
  @CreatedAt() createdAt!: Date;
  @UpdatedAt() updatedAt!: Date;
}
