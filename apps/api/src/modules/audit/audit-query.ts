import type { DataSource, SelectQueryBuilder } from 'typeorm';
import { AuditEvent as AuditEventRow } from '@gelpoint/db';
import { auditRange } from '@gelpoint/contracts';

export interface AuditFilters {
  objectType?: string;
  objectId?: string;
  actorId?: string;
  action?: string;
  from?: string;
  to?: string;
}

/** The shop's events that pass the filters, newest first; ties in time are broken by id so paging is stable. */
export function auditQuery(ds: DataSource, shopId: string, f: AuditFilters): SelectQueryBuilder<AuditEventRow> {
  const qb = ds
    .getRepository(AuditEventRow)
    .createQueryBuilder('e')
    .where('e.shop_id = :shopId', { shopId })
    .orderBy('e.created_at', 'DESC')
    .addOrderBy('e.id', 'DESC');
  if (f.objectType) qb.andWhere('e.object_type = :t', { t: f.objectType });
  if (f.objectId) qb.andWhere('e.object_id = :o', { o: f.objectId });
  if (f.actorId) qb.andWhere('e.actor_user_id = :actorId', { actorId: f.actorId });
  if (f.action) {
    // "lot" is every lot event; "lot.delete" only deletions.
    if (f.action.includes('.')) qb.andWhere('e.action = :action', { action: f.action });
    else qb.andWhere(`split_part(e.action, '.', 1) = :kind`, { kind: f.action });
  }
  const { fromAt, toAt } = auditRange(f.from, f.to);
  if (fromAt) qb.andWhere('e.created_at >= :fromAt', { fromAt });
  if (toAt) qb.andWhere('e.created_at < :toAt', { toAt });
  return qb;
}

/** The exact instant of an event, to the microsecond the database keeps: a cursor that skips and repeats nothing. */
export const CURSOR_AT = `to_char(e.created_at AT TIME ZONE 'UTC', 'YYYY-MM-DD"T"HH24:MI:SS.US"Z"')`;

/** Only events older than the last one shown: by time, then by id among events of the same instant. */
export function olderThan(qb: SelectQueryBuilder<AuditEventRow>, before: string, beforeId?: string): SelectQueryBuilder<AuditEventRow> {
  if (beforeId) return qb.andWhere('(e.created_at, e.id) < (CAST(:before AS timestamptz), CAST(:beforeId AS uuid))', { before, beforeId });
  return qb.andWhere('e.created_at < :before', { before });
}

/** A page of events with the cursor of its last one. */
export async function pageOf(
  qb: SelectQueryBuilder<AuditEventRow>,
  limit: number,
): Promise<{ rows: AuditEventRow[]; last: { before: string; beforeId: string } | null }> {
  const { entities, raw } = await qb.addSelect(CURSOR_AT, 'cursor_at').limit(limit).getRawAndEntities();
  const lastRaw = raw.at(-1) as { cursor_at: string } | undefined;
  const lastRow = entities.at(-1);
  return { rows: entities, last: lastRaw && lastRow ? { before: lastRaw.cursor_at, beforeId: lastRow.id } : null };
}
