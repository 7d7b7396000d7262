import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import { CreatedAt, UpdatedAt } from './columns';

@Entity({ name: 'users' })
@Index('users_email_key', ['email'], { unique: true })
export class User {
  @PrimaryGeneratedColumn('uuid', { primaryKeyConstraintName: 'users_pkey' }) id!: string;
  /** Stored lower-cased and trimmed; the unique index relies on that. */
  @Column({ type: 'text' }) email!: string;
  @Column({ type: 'text' }) name!: string;
  @Column({ name: 'password_hash', type: 'text' }) passwordHash!: string;
  @Column({ name: 'password_changed_at', type: 'timestamptz', default: () => 'now()' }) passwordChangedAt!: Date;
  @CreatedAt() createdAt!: Date;
  @UpdatedAt() updatedAt!: Date;
}
