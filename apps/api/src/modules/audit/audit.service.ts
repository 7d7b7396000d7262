import type { EntityManager } from 'typeorm';
import { AuditEvent } from '@gelpoint/db';

export interface Actor {
  userId: string;
  userName: string;
}

export interface AuditEntry {
  shopId: string | null;
  actor: Actor | null;
  action: string;
  objectType: string;
  objectId: string | null;
  detail?: Record<string, unknown>;
}

/** Written in the caller's transaction, so the record exists exactly when the change does. */
export async function recordAudit(m: EntityManager, e: AuditEntry): Promise<void> {
  await m.insert(AuditEvent, {
    shopId: e.shopId,
    actorUserId: e.actor?.userId ?? null,
    actorName: e.actor?.userName ?? null,
    action: e.action,
    objectType: e.objectType,
    objectId: e.objectId,
    // TypeORM's insert type cannot see through a jsonb column typed as a plain record.
    detail: (e.detail ?? {}) as never,
  });
}
