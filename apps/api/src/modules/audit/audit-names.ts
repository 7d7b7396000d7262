import type { EntityManager } from 'typeorm';
import type { AuditEvent as AuditEventRow } from '@gelpoint/db';
import type { AuditEvent } from '@gelpoint/contracts';

/**
 * How each kind of object is found by id within one shop, its name today and its page in the web app. Objects of
 * another shop are never looked at: every query filters by the shop.
 */
const objectLookups: Record<string, { sql: string; link: (id: string) => string }> = {
  piece: { sql: 'SELECT id::text AS id, name FROM pieces WHERE shop_id = $1 AND id = ANY($2::uuid[])', link: (id) => `/pieces/${id}` },
  pour_plan: { sql: 'SELECT id::text AS id, name FROM pour_plans WHERE shop_id = $1 AND id = ANY($2::uuid[])', link: (id) => `/pour-plans/${id}` },
  mold: { sql: 'SELECT id::text AS id, name FROM molds WHERE shop_id = $1 AND id = ANY($2::uuid[])', link: (id) => `/moulds/${id}` },
  lot: { sql: 'SELECT id::text AS id, lot_number AS name FROM lots WHERE shop_id = $1 AND id = ANY($2::uuid[])', link: (id) => `/shelf/lots/${id}` },
  resin_system: {
    sql: 'SELECT id::text AS id, name FROM resin_systems WHERE shop_id = $1 AND id = ANY($2::uuid[])',
    link: (id) => `/shelf/resin-systems/${id}`,
  },
  pigment: { sql: 'SELECT id::text AS id, name FROM pigments WHERE shop_id = $1 AND id = ANY($2::uuid[])', link: (id) => `/shelf/pigments/${id}` },
  // A pour is known by its piece.
  pour: {
    sql: 'SELECT p.id::text AS id, pc.name FROM pours p JOIN pieces pc ON pc.id = p.piece_id WHERE p.shop_id = $1 AND p.id = ANY($2::uuid[])',
    link: (id) => `/pours/${id}`,
  },
  membership: {
    sql: 'SELECT m.id::text AS id, u.name FROM memberships m JOIN users u ON u.id = m.user_id WHERE m.shop_id = $1 AND m.id = ANY($2::uuid[])',
    link: () => '/team',
  },
  invitation: { sql: 'SELECT id::text AS id, email AS name FROM invitations WHERE shop_id = $1 AND id = ANY($2::uuid[])', link: () => '/team' },
  user: {
    sql: 'SELECT u.id::text AS id, u.name FROM users u JOIN memberships m ON m.user_id = u.id AND m.shop_id = $1 WHERE u.id = ANY($2::uuid[])',
    link: () => '/team',
  },
  shop: { sql: 'SELECT id::text AS id, name FROM shops WHERE id = $1 AND id = ANY($2::uuid[])', link: () => '/shop-settings' },
};

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** The name the event itself wrote down, for an object that no longer exists. */
function recordedName(detail: Record<string, unknown>): string | null {
  for (const key of ['name', 'lotNumber', 'email']) {
    const value = detail[key];
    if (typeof value === 'string' && value !== '') return value;
  }
  return null;
}

/**
 * Events as the audit answers them: the actor by their name today, the object by its name and link while it exists
 * (otherwise by what the event recorded). One query per kind of object on the page, whatever its length.
 */
export async function namedEvents(m: EntityManager, shopId: string, rows: readonly AuditEventRow[]): Promise<AuditEvent[]> {
  const idsByType = new Map<string, Set<string>>();
  for (const r of rows) {
    if (!r.objectId || !UUID.test(r.objectId) || !objectLookups[r.objectType]) continue;
    const ids = idsByType.get(r.objectType) ?? new Set<string>();
    ids.add(r.objectId);
    idsByType.set(r.objectType, ids);
  }
  const names = new Map<string, string>();
  for (const [type, ids] of idsByType) {
    const found: { id: string; name: string }[] = await m.query(objectLookups[type]!.sql, [shopId, [...ids]]);
    for (const f of found) names.set(`${type}:${f.id}`, f.name);
  }
  const actorIds = [...new Set(rows.map((r) => r.actorUserId).filter((id): id is string => id !== null))];
  const actors = new Map<string, string>(
    actorIds.length
      ? ((await m.query('SELECT id::text AS id, name FROM users WHERE id = ANY($1::uuid[])', [actorIds])) as { id: string; name: string }[]).map((u) => [
          u.id,
          u.name,
        ])
      : [],
  );
  return rows.map((e) => {
    const key = `${e.objectType}:${e.objectId}`;
    const current = e.objectId ? names.get(key) : undefined;
    return {
      id: e.id,
      at: e.createdAt.toISOString(),
      actor: e.actorUserId ? { id: e.actorUserId, name: actors.get(e.actorUserId) ?? e.actorName ?? '' } : null,
      action: e.action,
      objectType: e.objectType,
      objectId: e.objectId,
      objectName: current ?? recordedName(e.detail),
      link: current !== undefined && e.objectId ? objectLookups[e.objectType]!.link(e.objectId) : null,
      detail: e.detail,
    };
  });
}
