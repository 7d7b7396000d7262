import type { EntityManager } from 'typeorm';
import type { CureReading, PlanSnapshot, PourPlan as CorePourPlan, ReleaseCheck, ShopHours } from '@gelpoint/core';
import { Piece, Pour, PourPlan, Shop } from '@gelpoint/db';
import { notFound } from '../../http/errors';
import { storedPlanResult, storedPlanSnapshot } from '../pour-plans/stored-plan';

/** A pour with what its cure is worked out from: the piece, the plan, and the plan's stored result and products. */
export interface LoadedPour {
  pour: Pour;
  piece: Piece;
  plan: PourPlan;
  result: CorePourPlan;
  snapshot: PlanSnapshot;
}

/** The shop settings the cure model, the reminders and the guards follow. */
export type CureSettings = Pick<Shop, 'readingCarryH' | 'windowCloseLeadMin' | 'offRatioTolerancePct' | 'timeZone' | 'dayStartHour' | 'quietFromHour'>;

/** The shop's clock as quiet hours read it. */
export function shopHoursOf(s: Pick<Shop, 'timeZone' | 'dayStartHour' | 'quietFromHour'>): ShopHours {
  return { zone: s.timeZone, dayStartHour: s.dayStartHour, quietFromHour: s.quietFromHour };
}

export interface LoggedStep {
  step: string;
  mixed_at: Date;
}

export function loadedOf(pour: Pour, plan: PourPlan, piece: Piece): LoadedPour {
  return { pour, piece, plan, result: storedPlanResult(plan.result), snapshot: storedPlanSnapshot(plan.productSnapshot) };
}

export async function loadPour(m: EntityManager, shopId: string, id: string, lock = false): Promise<LoadedPour> {
  const pour = await m.findOne(Pour, { where: { id, shopId }, ...(lock ? { lock: { mode: 'pessimistic_write' as const } } : {}) });
  if (!pour) throw notFound('pour');
  const plan = await m.findOneByOrFail(PourPlan, { id: pour.pourPlanId });
  const piece = await m.findOneByOrFail(Piece, { id: pour.pieceId });
  return loadedOf(pour, plan, piece);
}

export async function cureSettingsOf(m: EntityManager, shopId: string): Promise<CureSettings> {
  return m.findOneOrFail(Shop, {
    where: { id: shopId },
    select: { id: true, readingCarryH: true, windowCloseLeadMin: true, offRatioTolerancePct: true, timeZone: true, dayStartHour: true, quietFromHour: true },
  });
}

/** The readings the cure counts (voided ones left out), in time order. */
export async function liveReadingsOf(m: EntityManager, pourId: string): Promise<CureReading[]> {
  const rows: { taken_at: Date; temp_c: number }[] = await m.query(
    'SELECT taken_at, temp_c FROM temperature_readings WHERE pour_id = $1 AND voided_at IS NULL ORDER BY taken_at',
    [pourId],
  );
  return rows.map((r) => ({ at: r.taken_at.toISOString(), tempC: r.temp_c }));
}

/** The steps of the cups logged (voided ones left out): what the cure clock runs from. */
export async function loggedStepsOf(m: EntityManager, pourId: string): Promise<LoggedStep[]> {
  return m.query('SELECT step, mixed_at FROM pour_batches WHERE pour_id = $1 AND voided_at IS NULL', [pourId]);
}

export async function checksOf(m: EntityManager, pourId: string): Promise<(ReleaseCheck & { stage: string })[]> {
  const rows: { checked_at: Date; hardness_shore_d: number | null; stage: string }[] = await m.query(
    'SELECT checked_at, hardness_shore_d, stage FROM cure_checks WHERE pour_id = $1',
    [pourId],
  );
  return rows.map((r) => ({ checkedAt: r.checked_at, hardnessShoreD: r.hardness_shore_d, stage: r.stage }));
}

export function groupByPour<T extends { pour_id: string }>(rows: T[]): Map<string, T[]> {
  const out = new Map<string, T[]>();
  for (const r of rows) {
    const list = out.get(r.pour_id);
    if (list) list.push(r);
    else out.set(r.pour_id, [r]);
  }
  return out;
}

/** The members who hear of a release or machining: the plan's maker and every active lead of the shop. */
export async function makerAndLeadsOf(m: EntityManager, shopId: string, makerId: string | null): Promise<string[]> {
  const leads: { user_id: string }[] = await m.query(`SELECT user_id FROM memberships WHERE shop_id = $1 AND role = 'lead' AND status = 'active'`, [shopId]);
  return [...new Set([...(makerId ? [makerId] : []), ...leads.map((r) => r.user_id)])];
}
