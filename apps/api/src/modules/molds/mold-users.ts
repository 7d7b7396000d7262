import type { EntityManager } from 'typeorm';

const NAMED = 5;

/** The pour plans that take their cavity from a mould (by its column, or by the mould named in their inputs). */
export async function plansUsingMold(m: EntityManager, shopId: string, moldId: string): Promise<string[]> {
  const rows: { name: string }[] = await m.query(
    `SELECT name FROM pour_plans
      WHERE shop_id = $1 AND (mold_id = $2 OR inputs -> 'cavity' ->> 'moldId' = $2::text)
      ORDER BY updated_at DESC, id`,
    [shopId, moldId],
  );
  return rows.map((r) => r.name);
}

/** "“A”", "“A” and “B”", "“A”, “B” and 3 more". */
export function namedList(names: readonly string[]): string {
  const quoted = names.slice(0, NAMED).map((n) => `“${n}”`);
  const more = names.length - quoted.length;
  if (more > 0) return `${quoted.join(', ')} and ${more} more`;
  return quoted.length > 1 ? `${quoted.slice(0, -1).join(', ')} and ${quoted.at(-1)}` : (quoted[0] ?? '');
}
