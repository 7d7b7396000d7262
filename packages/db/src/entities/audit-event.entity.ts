import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import { CreatedAt } from './columns';

/** Append-only: who did what to which object, when. Actor and shop survive the deletion of what they name. */
@Entity({ name: 'audit_events' })
@Index('audit_events_shop_created_idx', ['shopId', 'createdAt'])
@Index('audit_events_object_idx', ['objectType', 'objectId'])
export class AuditEvent {
  @PrimaryGeneratedColumn('uuid', { primaryKeyConstraintName: 'audit_events_pkey' }) id!: string;
  @Column({ name: 'shop_id', type: 'uuid', nullable: true }) shopId!: string | null;
  @Column({ name: 'actor_user_id', type: 'uuid', nullable: true }) actorUserId!: string | null;
  @Column({ name: 'actor_name', type: 'text', nullable: true }) actorName!: string | null;
  @Column({ type: 'text' }) action!: string;
  @Column({ name: 'object_type', type: 'text' }) objectType!: string;
  @Column({ name: 'object_id', type: 'text', nullable: true }) objectId!: string | null;
  @Column({ type: 'jsonb', default: () => "'{}'::jsonb" }) detail!: Record<string, unknown>;
  @CreatedAt() createdAt!: Date;
}
