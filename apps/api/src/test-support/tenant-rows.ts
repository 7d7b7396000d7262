import type { DataSource } from 'typeorm';

/**
 * Row counts of every table in the schema, limited to what a set of shops (and the people in them)
 * own, so that tests of other files writing to the same database at the same time do not disturb
 * the comparison. A table the scoping rules do not understand is an error, not a silent skip: a new
 * table has to be thought about here before a "nothing written" check can vouch for it.
 */
export interface TenantScope {
  shopIds: string[];
  /** Text that every shop name, person name or e-mail the test sends contains. */
  marker: string;
}

/** Tables no request can write to, counted whole. */
const FIXED_TABLES = new Set(['schema_migrations']);
/** Request bookkeeping that counts refused requests too, by design (a refused sign-in still spends an attempt). */
const BOOKKEEPING_TABLES = new Set(['rate_limit_counters']);

export async function tenantRowCounts(ds: DataSource, scope: TenantScope): Promise<Record<string, number>> {
  const like = `%${scope.marker}%`;
  const shops: { id: string }[] = await ds.query(
    `SELECT s.id FROM shops s
      WHERE s.id = ANY($1::uuid[]) OR s.name ILIKE $2
         OR EXISTS (SELECT 1 FROM memberships m JOIN users u ON u.id = m.user_id WHERE m.shop_id = s.id AND (u.email ILIKE $2 OR u.name ILIKE $2))`,
    [scope.shopIds, like],
  );
  const shopIds = shops.map((s) => s.id);
  const users: { id: string; email: string }[] = await ds.query(
    `SELECT u.id, u.email FROM users u
      WHERE u.email ILIKE $2 OR u.name ILIKE $2 OR EXISTS (SELECT 1 FROM memberships m WHERE m.user_id = u.id AND m.shop_id = ANY($1::uuid[]))`,
    [shopIds, like],
  );
  const userIds = users.map((u) => u.id);
  const emails = users.map((u) => u.email);

  const columns: { table_name: string; column_name: string }[] = await ds.query(
    `SELECT c.table_name, c.column_name FROM information_schema.columns c
       JOIN information_schema.tables t ON t.table_schema = c.table_schema AND t.table_name = c.table_name
      WHERE c.table_schema = 'public' AND t.table_type = 'BASE TABLE'`,
  );
  const byTable = new Map<string, Set<string>>();
  for (const c of columns) (byTable.get(c.table_name) ?? byTable.set(c.table_name, new Set()).get(c.table_name)!).add(c.column_name);

  const counts: Record<string, number> = {};
  for (const [table, cols] of [...byTable].sort(([a], [b]) => a.localeCompare(b))) {
    if (BOOKKEEPING_TABLES.has(table)) continue;
    const where = scopeOf(table, cols);
    const rows: { n: string }[] = await ds.query(`SELECT count(*) AS n FROM "${table}" WHERE (${where}) AND ${TYPED_PLACEHOLDERS}`, [
      shopIds,
      userIds,
      emails,
      like,
    ]);
    counts[table] = Number(rows[0]!.n);
  }
  return counts;
}

// $1 shop ids, $2 user ids, $3 their e-mails, $4 the marker as a LIKE pattern.
function scopeOf(table: string, cols: Set<string>): string {
  if (FIXED_TABLES.has(table)) return 'true';
  if (table === 'shops') return 'id = ANY($1::uuid[])';
  if (table === 'users') return 'id = ANY($2::uuid[])';
  const parts: string[] = [];
  if (cols.has('shop_id')) parts.push('shop_id = ANY($1::uuid[])');
  if (cols.has('user_id')) parts.push('user_id = ANY($2::uuid[])');
  if (cols.has('to_address')) parts.push('(to_address = ANY($3::text[]) OR to_address ILIKE $4)');
  if (cols.has('email')) parts.push('email ILIKE $4');
  if (cols.has('mold_id')) parts.push('mold_id IN (SELECT id FROM molds WHERE shop_id = ANY($1::uuid[]))');
  if (parts.length === 0) throw new Error(`no rule in tenant-rows.ts says which rows of table ${table} belong to a shop; add one`);
  return parts.join(' OR ');
}

// Placeholders a table's rule does not use still have to appear with a type, or PostgreSQL refuses the query.
const TYPED_PLACEHOLDERS = 'cardinality($1::uuid[]) >= 0 AND cardinality($2::uuid[]) >= 0 AND cardinality($3::text[]) >= 0 AND $4::text IS NOT NULL';
