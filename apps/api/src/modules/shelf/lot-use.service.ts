import type { DataSource } from 'typeorm';
import type { LotUse } from '@gelpoint/contracts';

type LotPart = LotUse['part'];
import { notFound } from '../../http/errors';

interface UseRow {
  batch_id: string;
  pour_id: string;
  piece_id: string;
  piece_name: string;
  plan_name: string;
  step: string;
  plan_batch_index: number;
  weighed_g: number;
  mixed_at: Date;
  mixed_by_id: string | null;
  mixed_by_name: string | null;
  voided: boolean;
}

// The weighed grams of the lot's own part: a part B lot is traced by what was weighed of part B.
const weighedColumn: Record<LotPart, string> = { A: 'b.weighed_a_g', B: 'b.weighed_b_g', pigment: 'b.weighed_pigment_g' };
const lotColumn: Record<LotPart, string> = { A: 'b.lot_a_id', B: 'b.lot_b_id', pigment: 'b.lot_pigment_id' };

/** Every cup mixed from a lot of the shop, newest first: the batch, its pour and piece, the grams weighed, who mixed it. */
export async function lotUses(
  ds: DataSource,
  shopId: string,
  lotId: string,
  page: { limit: number; offset: number },
): Promise<{ items: LotUse[]; total: number }> {
  const lots: { part: LotPart }[] = await ds.query('SELECT part FROM lots WHERE id = $1 AND shop_id = $2', [lotId, shopId]);
  const part = lots[0]?.part;
  if (!part) throw notFound('lot');
  const from = `FROM pour_batches b
      JOIN pours p ON p.id = b.pour_id
      JOIN pieces pc ON pc.id = p.piece_id
      JOIN pour_plans pp ON pp.id = p.pour_plan_id
      LEFT JOIN users u ON u.id = b.mixed_by_id
     WHERE b.shop_id = $1 AND ${lotColumn[part]} = $2`;
  const [count] = (await ds.query(`SELECT count(*)::int AS n ${from}`, [shopId, lotId])) as { n: number }[];
  const rows: UseRow[] = await ds.query(
    `SELECT b.id AS batch_id, b.pour_id, pc.id AS piece_id, pc.name AS piece_name, pp.name AS plan_name, b.step, b.plan_batch_index,
            ${weighedColumn[part]} AS weighed_g, b.mixed_at, b.mixed_by_id, u.name AS mixed_by_name,
            b.voided_at IS NOT NULL AS voided
       ${from}
      ORDER BY b.mixed_at DESC, b.id
      LIMIT $3 OFFSET $4`,
    [shopId, lotId, page.limit, page.offset],
  );
  return {
    total: count?.n ?? 0,
    items: rows.map((r) => ({
      batchId: r.batch_id,
      pourId: r.pour_id,
      piece: { id: r.piece_id, name: r.piece_name },
      planName: r.plan_name,
      step: r.step,
      planBatchIndex: r.plan_batch_index,
      part,
      weighedG: r.weighed_g,
      mixedAt: r.mixed_at.toISOString(),
      mixedBy: r.mixed_by_id ? { id: r.mixed_by_id, name: r.mixed_by_name ?? '' } : null,
      voided: r.voided,
    })),
  };
}
