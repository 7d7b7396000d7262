import { Check, Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { CreatedAt } from './columns';
import type { Role } from './membership.entity';
import { Shop } from './shop.entity';
import { User } from './user.entity';

@Entity({ name: 'invitations' })
@Check('invitations_role_check', `role IN ('lead', 'maker', 'apprentice')`)
@Index('invitations_token_hash_key', ['tokenHash'], { unique: true })
@Index('invitations_shop_idx', ['shopId'])
export class Invitation {
  @PrimaryGeneratedColumn('uuid', { primaryKeyConstraintName: 'invitations_pkey' }) id!: string;
  @Column({ name: 'shop_id', type: 'uuid' }) shopId!: string;
  @Column({ type: 'text' }) email!: string;
  @Column({ type: 'text' }) role!: Role;
  /** sha256 of the one-time token; the token itself only ever travels in the e-mail. */
  @Column({ name: 'token_hash', type: 'text' }) tokenHash!: string;
  @Column({ name: 'invited_by_id', type: 'uuid', nullable: true }) invitedById!: string | null;
  @Column({ name: 'expires_at', type: 'timestamptz' }) expiresAt!: Date;
  @Column({ name: 'accepted_at', type: 'timestamptz', nullable: true }) acceptedAt!: Date | null;
  @Column({ name: 'revoked_at', type: 'timestamptz', nullable: true }) revokedAt!: Date | null;
  @ManyToOne(() => Shop, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'shop_id', foreignKeyConstraintName: 'invitations_shop_fk' })
  shop?: Shop;
  @ManyToOne(() => User, { onDelete: 'SET NULL' })
  @JoinColumn({ name: 'invited_by_id', foreignKeyConstraintName: 'invitations_invited_by_fk' })
  invitedBy?: User | null;
  @CreatedAt() createdAt!: Date;
}
