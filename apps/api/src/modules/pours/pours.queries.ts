import { In, type DataSource, type DeepPartial, type EntityManager } from 'typeorm';
import { CureCheck, Piece, Pour, PourBatch, PourPlan, Reminder, TemperatureReading } from '@gelpoint/db';
import { groupByPour } from './pour-queries';

// The pours module's data access: every query the service runs, by what it returns. No rules live here.

export interface PourListFilter {
  status: 'active' | 'released' | 'machined' | 'all';
  readyToday: 'true' | 'false';
  pieceId?: string;
  pourPlanId?: string;
  limit: number;
  offset: number;
}

/** One page of a shop's pours, newest first, with the count of all that match. */
export async function pourPage(ds: DataSource, shopId: string, q: PourListFilter): Promise<[Pour[], number]> {
  const qb = ds.getRepository(Pour).createQueryBuilder('p').where('p.shop_id = :shopId', { shopId });
  if (q.status === 'active') qb.andWhere(`p.status = 'open'`);
  else if (q.status !== 'all') qb.andWhere('p.status = :s', { s: q.status });
  if (q.pieceId) qb.andWhere('p.piece_id = :pieceId', { pieceId: q.pieceId });
  if (q.pourPlanId) qb.andWhere('p.pour_plan_id = :pourPlanId', { pourPlanId: q.pourPlanId });
  if (q.readyToday === 'true') {
    // Ready today: open pours whose ready-to-machine reminder falls before the end of the day.
    qb.andWhere(`p.status = 'open'`).andWhere(
      `EXISTS (SELECT 1 FROM reminders r WHERE r.pour_id = p.id AND r.kind = 'ready_to_machine' AND r.status <> 'cancelled' AND r.due_at < date_trunc('day', now()) + interval '1 day')`,
    );
  }
  return qb.orderBy('p.createdAt', 'DESC').addOrderBy('p.id').take(q.limit).skip(q.offset).getManyAndCount();
}

export interface PageBatchRow {
  pour_id: string;
  step: string;
  mixed_at: Date;
  warnings: { code: string }[];
  voided: boolean;
}
export interface PageReadingRow {
  pour_id: string;
  taken_at: Date;
  temp_c: number;
  voided: boolean;
}
export interface PageCheckRow {
  pour_id: string;
  checked_at: Date;
  hardness_shore_d: number | null;
  stage: string;
}

/**
 * Everything a page of pours shows in a fixed number of queries, whatever its length: plans, pieces, and the
 * logged batches, readings, checks and next pending reminder of every pour on it.
 */
export async function pourPageDetails(m: EntityManager, pours: Pour[]) {
  const ids = pours.map((p) => p.id);
  const plans = new Map((await m.findBy(PourPlan, { id: In(pours.map((p) => p.pourPlanId)) })).map((p) => [p.id, p]));
  const pieces = new Map((await m.findBy(Piece, { id: In(pours.map((p) => p.pieceId)) })).map((p) => [p.id, p]));
  const batches = groupByPour<PageBatchRow>(
    ids.length
      ? await m.query('SELECT pour_id, step, mixed_at, warnings, voided_at IS NOT NULL AS voided FROM pour_batches WHERE pour_id = ANY($1)', [ids])
      : [],
  );
  const readings = groupByPour<PageReadingRow>(
    ids.length
      ? await m.query(
          'SELECT pour_id, taken_at, temp_c, voided_at IS NOT NULL AS voided FROM temperature_readings WHERE pour_id = ANY($1) ORDER BY pour_id, taken_at',
          [ids],
        )
      : [],
  );
  const checks = groupByPour<PageCheckRow>(
    ids.length ? await m.query('SELECT pour_id, checked_at, hardness_shore_d, stage FROM cure_checks WHERE pour_id = ANY($1)', [ids]) : [],
  );
  const next = ids.length
    ? await m
        .getRepository(Reminder)
        .createQueryBuilder('r')
        .distinctOn(['r.pourId'])
        .where('r.pourId IN (:...ids)', { ids })
        .andWhere(`r.status = 'pending'`)
        .andWhere('r.doneAt IS NULL')
        .orderBy('r.pourId')
        .addOrderBy('r.dueAt', 'ASC')
        .getMany()
    : [];
  return { plans, pieces, batches, readings, checks, nextOf: new Map(next.map((r) => [r.pourId, r])) };
}

/** A pour's whole log, voided entries included, in the order the pour page shows it. */
export async function pourLogOf(m: EntityManager, pourId: string) {
  return {
    batches: await m.find(PourBatch, { where: { pourId }, order: { planBatchIndex: 'ASC', createdAt: 'ASC' } }),
    readings: await m.find(TemperatureReading, { where: { pourId }, order: { takenAt: 'ASC', createdAt: 'ASC' } }),
    checks: await m.find(CureCheck, { where: { pourId }, order: { checkedAt: 'ASC' } }),
    reminders: await m.find(Reminder, { where: { pourId }, order: { dueAt: 'ASC' } }),
  };
}

/** Which of these users are active members of the shop. */
export async function activeMembersAmong(m: EntityManager, shopId: string, userIds: string[]): Promise<string[]> {
  const rows: { user_id: string }[] = await m.query(`SELECT user_id FROM memberships WHERE shop_id = $1 AND status = 'active' AND user_id = ANY($2)`, [
    shopId,
    userIds,
  ]);
  return rows.map((r) => r.user_id);
}

/** A cure check's photo and its type, or null when the check has none (or is not this shop's). */
export async function cureCheckPhoto(ds: DataSource, shopId: string, pourId: string, checkId: string): Promise<{ bytes: Buffer; type: string } | null> {
  const rows: { photo: Buffer | null; photo_type: string | null }[] = await ds.query(
    'SELECT photo, photo_type FROM cure_checks WHERE id = $1 AND pour_id = $2 AND shop_id = $3',
    [checkId, pourId, shopId],
  );
  return rows[0]?.photo && rows[0].photo_type ? { bytes: rows[0].photo, type: rows[0].photo_type } : null;
}

/** Reminders due in the next 24 hours or overdue and not done, and those sent in the last 24 hours, with their piece. */
export async function dueReminders(ds: DataSource, shopId: string): Promise<{ reminder: Reminder; pieceName: string }[]> {
  const found = await ds
    .getRepository(Reminder)
    .createQueryBuilder('r')
    .innerJoin(Pour, 'p', 'p.id = r.pour_id')
    .innerJoin(Piece, 'pc', 'pc.id = p.piece_id')
    .addSelect('pc.name', 'piece_name')
    .where('r.shop_id = :shopId', { shopId })
    .andWhere(`r.status <> 'cancelled'`)
    .andWhere('r.done_at IS NULL')
    .andWhere(`r.due_at < now() + interval '24 hours'`)
    .andWhere(`(r.status = 'pending' OR r.sent_at > now() - interval '24 hours')`)
    .orderBy('r.due_at')
    .limit(200)
    .getRawAndEntities();
  return found.entities.map((reminder, i) => ({ reminder, pieceName: String(found.raw[i]?.piece_name ?? '') }));
}

export async function openPourCount(ds: DataSource, shopId: string): Promise<number> {
  const rows: { n: number }[] = await ds.query(`SELECT count(*)::int AS n FROM pours WHERE shop_id = $1 AND status = 'open'`, [shopId]);
  return rows[0]?.n ?? 0;
}

export async function setIngestTokenHash(m: EntityManager, shopId: string, hash: string): Promise<void> {
  await m.query('UPDATE shops SET ingest_token_hash = $2 WHERE id = $1', [shopId, hash]);
}

export async function shopOfIngestTokenHash(ds: DataSource, hash: string): Promise<string | null> {
  const shops: { id: string }[] = await ds.query('SELECT id FROM shops WHERE ingest_token_hash = $1', [hash]);
  return shops[0]?.id ?? null;
}

export async function setPieceStage(m: EntityManager, pieceId: string, stage: Piece['stage']): Promise<void> {
  await m.update(Piece, { id: pieceId }, { stage });
}

export async function pourPlanOf(m: EntityManager, shopId: string, pourPlanId: string): Promise<PourPlan | null> {
  return m.findOneBy(PourPlan, { id: pourPlanId, shopId });
}

export async function insertPour(m: EntityManager, pour: DeepPartial<Pour>): Promise<Pour> {
  return m.save(m.create(Pour, pour));
}

export async function updatePour(
  m: EntityManager,
  pourId: string,
  change: Partial<Pick<Pour, 'status' | 'releasedAt' | 'releasedById' | 'machinedAt' | 'finishCoats' | 'finishCoatIntervalH'>>,
): Promise<void> {
  await m.update(Pour, { id: pourId }, change);
}

export async function insertCureCheck(m: EntityManager, check: DeepPartial<CureCheck>): Promise<CureCheck> {
  return m.save(m.create(CureCheck, check));
}

export async function reminderById(m: EntityManager, reminderId: string): Promise<Reminder> {
  return m.getRepository(Reminder).findOneByOrFail({ id: reminderId });
}
