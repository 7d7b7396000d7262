import type { DataSource } from 'typeorm';
import { shopLocalDate } from '@gelpoint/core';
import { Lot, Pigment, ResinSystem, Shop } from '@gelpoint/db';
import type { LotInput, LotSort, LotView } from '@gelpoint/contracts';
import type { AuthContext } from '../../http/auth-context';
import { AppError, notFound } from '../../http/errors';
import { recordAudit } from '../audit/audit.service';
import { likePattern } from './catalogue.service';
import { lotView, type ShopInstant } from './shelf-views';
import { orderByColumn, type SortDir } from './shelf-sort';

export interface LotQuery {
  q?: string;
  part?: 'A' | 'B' | 'pigment';
  productId?: string;
  status: 'all' | 'in_stock' | 'low' | 'expired';
  sort?: LotSort;
  dir: SortDir;
  limit: number;
  offset: number;
}

type LotRow = Lot & { productName: string };

// The database collates bytewise ("C"), so names are compared in lower case to read as people expect.
const lotSortColumns: Record<LotSort, string> = {
  lotNumber: 'lower(l.lot_number)',
  product: 'lower(COALESCE(r.name, g.name))',
  part: 'l.part',
  remaining: 'l.remaining_g',
  received: 'l.received_on',
  expires: 'l.expires_on',
  // Stock state, worst first: expired (unusable however much is left), then used up, then low (under a
  // tenth of what came in), then in stock — the same rules as the lot's own expired and low flags.
  state: 'CASE WHEN l.expires_on < :shopToday THEN 0 WHEN l.remaining_g <= 0 THEN 1 WHEN l.remaining_g < l.quantity_g * 0.1 THEN 2 ELSE 3 END',
};

// Expiry is judged by the shop's calendar date (core's lotExpired), passed to the SQL as :shopToday so the database's
// own date and zone never decide it.
function baseQuery(ds: DataSource, shopId: string, at: ShopInstant) {
  return ds
    .getRepository(Lot)
    .createQueryBuilder('l')
    .leftJoin(ResinSystem, 'r', 'r.id = l.resin_system_id')
    .leftJoin(Pigment, 'g', 'g.id = l.pigment_id')
    .addSelect('COALESCE(r.name, g.name)', 'product_name')
    .where('l.shop_id = :shopId', { shopId })
    .setParameter('shopToday', shopLocalDate(at.atMs, at.zone));
}

/** The instant of the caller's clock in the shop's zone. */
async function shopInstant(ds: DataSource, shopId: string, now: Date): Promise<ShopInstant> {
  const shop = await ds.manager.findOne(Shop, { where: { id: shopId }, select: { id: true, timeZone: true } });
  if (!shop) throw notFound('shop');
  return { atMs: now.getTime(), zone: shop.timeZone };
}

async function withNames(qb: ReturnType<typeof baseQuery>): Promise<LotRow[]> {
  const { entities, raw } = await qb.getRawAndEntities();
  return entities.map((e, i) => Object.assign(e, { productName: String((raw[i] as { product_name: string }).product_name ?? '') }));
}

export async function listLots(ds: DataSource, shopId: string, q: LotQuery, now = new Date()): Promise<{ items: LotView[]; total: number }> {
  const at = await shopInstant(ds, shopId, now);
  const qb = baseQuery(ds, shopId, at);
  if (q.part) qb.andWhere('l.part = :part', { part: q.part });
  if (q.productId) qb.andWhere('(l.resin_system_id = :pid OR l.pigment_id = :pid)', { pid: q.productId });
  if (q.q) qb.andWhere('(l.lot_number ILIKE :like OR r.name ILIKE :like OR g.name ILIKE :like)', { like: likePattern(q.q) });
  if (q.status === 'expired') qb.andWhere('l.expires_on < :shopToday');
  if (q.status === 'low') qb.andWhere('l.remaining_g < l.quantity_g * 0.1');
  if (q.status === 'in_stock') qb.andWhere('l.remaining_g > 0 AND (l.expires_on IS NULL OR l.expires_on >= :shopToday)');
  const total = await qb.getCount();
  const rows = await withNames(
    orderByColumn(qb, lotSortColumns[q.sort ?? 'expires'], q.dir, 'l.id')
      .offset(q.offset)
      .limit(q.limit),
  );
  return { items: rows.map((row) => lotView(row, at)), total };
}

export async function getLot(ds: DataSource, shopId: string, id: string, now = new Date()): Promise<LotView> {
  const at = await shopInstant(ds, shopId, now);
  const [row] = await withNames(baseQuery(ds, shopId, at).andWhere('l.id = :id', { id }));
  if (!row) throw notFound('lot');
  return lotView(row, at);
}

export async function createLot(
  ds: DataSource,
  auth: AuthContext,
  input: LotInput & { resinSystemId: string | null; pigmentId: string | null },
): Promise<LotView> {
  const id = await ds.transaction(async (m) => {
    // The product must be this shop's: another shop's id is "not found", as everywhere.
    const owner =
      input.part === 'pigment'
        ? await m.findOneBy(Pigment, { id: input.pigmentId!, shopId: auth.shopId })
        : await m.findOneBy(ResinSystem, { id: input.resinSystemId!, shopId: auth.shopId });
    if (!owner) throw new AppError('not_found', 'not_found', `no such ${input.part === 'pigment' ? 'pigment' : 'resin system'} on this shop's shelf`);
    const lot = await m.save(
      m.create(Lot, {
        shopId: auth.shopId,
        part: input.part,
        resinSystemId: input.resinSystemId,
        pigmentId: input.pigmentId,
        lotNumber: input.lotNumber,
        quantityG: input.quantityG,
        remainingG: input.quantityG,
        receivedOn: input.receivedOn,
        expiresOn: input.expiresOn ?? null,
        notes: input.notes ?? '',
      }),
    );
    await recordAudit(m, {
      shopId: auth.shopId,
      actor: auth,
      action: 'lot.create',
      objectType: 'lot',
      objectId: lot.id,
      detail: { lotNumber: lot.lotNumber, part: lot.part },
    });
    return lot.id;
  });
  return getLot(ds, auth.shopId, id);
}

export async function updateLot(
  ds: DataSource,
  auth: AuthContext,
  id: string,
  change: Partial<Pick<Lot, 'lotNumber' | 'remainingG' | 'expiresOn' | 'notes'>>,
): Promise<LotView> {
  await ds.transaction(async (m) => {
    const lot = await m.findOne(Lot, { where: { id, shopId: auth.shopId }, lock: { mode: 'pessimistic_write' } });
    if (!lot) throw notFound('lot');
    if (change.remainingG !== undefined && change.remainingG > lot.quantityG) {
      throw new AppError('bad_request', 'invalid_input', `remaining cannot exceed what was received (${lot.quantityG} g)`, {
        remainingG: `at most ${lot.quantityG} g`,
      });
    }
    if (change.expiresOn && change.expiresOn < lot.receivedOn) {
      throw new AppError('bad_request', 'invalid_input', 'a lot cannot expire before it was received', { expiresOn: `on or after ${lot.receivedOn}` });
    }
    await m.update(Lot, { id }, change);
    await recordAudit(m, { shopId: auth.shopId, actor: auth, action: 'lot.update', objectType: 'lot', objectId: id, detail: { ...change } });
  });
  return getLot(ds, auth.shopId, id);
}

export async function deleteLot(ds: DataSource, auth: AuthContext, id: string): Promise<void> {
  await ds.transaction(async (m) => {
    const lot = await m.findOneBy(Lot, { id, shopId: auth.shopId });
    if (!lot) throw notFound('lot');
    await m.delete(Lot, { id });
    await recordAudit(m, { shopId: auth.shopId, actor: auth, action: 'lot.delete', objectType: 'lot', objectId: id, detail: { lotNumber: lot.lotNumber } });
  });
}
