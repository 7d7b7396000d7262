import type { DataSource, EntityManager } from 'typeorm';
import { buildPourPlan, type PlanCavity, type PourPlan as CorePourPlan } from '@gelpoint/core';
import { Piece, Pigment, PourPlan, ResinSystem, toCorePigment, toCoreResinSystem } from '@gelpoint/db';
import type { PourPlanInput, PourPlanView } from '@gelpoint/contracts';
import { PourPlanInput as PourPlanInputSchema } from '@gelpoint/contracts';
import type { z } from 'zod';
import type { AuthContext } from '../../http/auth-context';
import { AppError, notFound } from '../../http/errors';
import { recordAudit } from '../audit/audit.service';
import { quickShapeCavity } from './plan-cavity';
import { measuredFromFloor, storedInputs, type MoldCavityLookup } from './plan-level';
import { storedPlanResult } from './stored-plan';

export type { MoldCavityLookup };

type PlanInput = z.output<typeof PourPlanInputSchema>;

async function activeProduct<T extends ResinSystem | Pigment>(m: EntityManager, entity: new () => T, shopId: string, id: string, what: string): Promise<T> {
  const row = (await m.findOne(entity, { where: { id, shopId } as never })) as T | null;
  if (!row) throw new AppError('not_found', 'not_found', `no such ${what} on this shop's shelf`);
  if (row.archivedAt) throw new AppError('unprocessable', 'product_archived', `${row.name} is archived; pick a product that is on the shelf`);
  return row;
}

async function compute(
  m: EntityManager,
  shopId: string,
  input: PlanInput,
  moldCavity: MoldCavityLookup,
  { scaleResolutionG, offRatioTolerancePct }: ShopScale,
) {
  const piece = await m.findOneBy(Piece, { id: input.pieceId, shopId });
  if (!piece) throw notFound('piece');
  const deep = await activeProduct(m, ResinSystem, shopId, input.deepPour.resinSystemId, 'resin system');
  const pigment = input.deepPour.pigmentId ? await activeProduct(m, Pigment, shopId, input.deepPour.pigmentId, 'pigment') : null;
  const seal = input.sealCoat ? await activeProduct(m, ResinSystem, shopId, input.sealCoat.resinSystemId, 'resin system') : null;

  let cavity: PlanCavity;
  let fillLevelMm = input.fillLevelMm;
  if (input.cavity.source === 'shape') {
    const shaped = quickShapeCavity(input.cavity.shape);
    if (!shaped.ok) throw new AppError('unprocessable', shaped.error.code, shaped.error.message);
    cavity = { curve: shaped.value.curve, wettedAreaMm2: shaped.value.wettedAreaMm2 };
  } else {
    ({ cavity, fillLevelMm } = await moldCavity.cavity(m, shopId, input.cavity.moldId, input.cavity.dam, input.fillLevelMm));
  }

  const snapshot = {
    deepPour: { id: deep.id, ...toCoreResinSystem(deep) },
    pigment: pigment ? { id: pigment.id, ...toCorePigment(pigment) } : null,
    sealCoat: seal ? { id: seal.id, ...toCoreResinSystem(seal) } : null,
    scaleResolutionG,
  };
  const planned = buildPourPlan({
    cavity,
    fillLevelMm,
    deepPour: { product: snapshot.deepPour, ...(snapshot.pigment ? { pigment: { pigment: snapshot.pigment, pct: input.deepPour.pigmentPct } } : {}) },
    ...(snapshot.sealCoat && input.sealCoat
      ? {
          sealCoat: {
            product: snapshot.sealCoat,
            filmThicknessMm: input.sealCoat.filmThicknessMm,
            coats: input.sealCoat.coats,
            absorptionFactor: input.sealCoat.absorptionFactor,
          },
        }
      : {}),
    overPourPct: input.overPourPct,
    cupWaste: input.cupWaste,
    scaleResolutionG: scaleResolutionG === 1 ? 1 : 0.1,
    offRatioTolerancePct,
    shopTempC: input.shopTempC,
    ...(input.shopAir ? { shopAir: input.shopAir } : {}),
    ...(input.wood ? { wood: input.wood } : {}),
  });
  if (!planned.ok) throw new AppError('unprocessable', planned.error.code, planned.error.message);
  return { result: planned.value, snapshot };
}

/** Everything weighed for the piece: the seal coat and the deep pour. */
function totalGramsOf(plan: Pick<CorePourPlan, 'sealCoat' | 'deepPour'>): number {
  return (plan.sealCoat?.totals.totalGrams ?? 0) + plan.deepPour.totals.totalGrams;
}

function view(p: PourPlan, inputs: Record<string, unknown> = p.inputs): PourPlanView {
  return { ...summaryOf(p, inputs), result: storedPlanResult(p.result) };
}

function summaryOf(p: PourPlan, inputs: Record<string, unknown> = p.inputs): Omit<PourPlanView, 'result'> {
  return {
    id: p.id,
    pieceId: p.pieceId,
    moldId: p.moldId,
    name: p.name,
    inputs,
    productSnapshot: p.productSnapshot,
    createdBy: p.createdBy ? { id: p.createdBy.id, name: p.createdBy.name } : null,
    createdAt: p.createdAt.toISOString(),
    updatedAt: p.updatedAt.toISOString(),
  };
}

interface ShopScale {
  scaleResolutionG: number;
  offRatioTolerancePct: number;
}

async function shopScale(m: EntityManager, shopId: string): Promise<ShopScale> {
  const rows: { scale_resolution_g: number; off_ratio_tolerance_pct: number }[] = await m.query(
    'SELECT scale_resolution_g, off_ratio_tolerance_pct FROM shops WHERE id = $1',
    [shopId],
  );
  return { scaleResolutionG: rows[0]?.scale_resolution_g ?? 0.1, offRatioTolerancePct: rows[0]?.off_ratio_tolerance_pct ?? 3 };
}

export class PourPlans {
  constructor(
    private readonly ds: DataSource,
    private readonly moldCavity: MoldCavityLookup,
  ) {}

  async get(shopId: string, id: string): Promise<PourPlanView> {
    const p = await this.ds.getRepository(PourPlan).findOne({ where: { id, shopId }, relations: { createdBy: true } as never });
    if (!p) throw notFound('pour plan');
    return view(p, await storedInputs(this.ds.manager, shopId, p.inputs, this.moldCavity));
  }

  async list(shopId: string, q: { pieceId?: string; limit: number; offset: number }) {
    const qb = this.ds.getRepository(PourPlan).createQueryBuilder('p').leftJoinAndSelect('p.createdBy', 'u').where('p.shop_id = :shopId', { shopId });
    if (q.pieceId) qb.andWhere('p.piece_id = :pieceId', { pieceId: q.pieceId });
    const [rows, total] = await qb.orderBy('p.updatedAt', 'DESC').addOrderBy('p.id').take(q.limit).skip(q.offset).getManyAndCount();
    return {
      total,
      items: rows.map((p) => {
        const { inputs: _i, productSnapshot: _s, ...rest } = summaryOf(p);
        return { ...rest, totalGrams: totalGramsOf(storedPlanResult(p.result)) };
      }),
    };
  }

  async create(auth: AuthContext, asked: PlanInput): Promise<PourPlanView> {
    const id = await this.ds.transaction(async (m) => {
      const input = await measuredFromFloor(m, auth.shopId, asked, this.moldCavity);
      const { result, snapshot } = await compute(m, auth.shopId, input, this.moldCavity, await shopScale(m, auth.shopId));
      const plan = await m.save(
        m.create(PourPlan, {
          shopId: auth.shopId,
          pieceId: input.pieceId,
          moldId: input.cavity.source === 'mold' ? input.cavity.moldId : null,
          name: input.name,
          inputs: input,
          productSnapshot: snapshot,
          result,
          createdById: auth.userId,
        }),
      );
      await recordAudit(m, {
        shopId: auth.shopId,
        actor: auth,
        action: 'pour_plan.create',
        objectType: 'pour_plan',
        objectId: plan.id,
        detail: { name: plan.name, pieceId: plan.pieceId },
      });
      return plan.id;
    });
    return this.get(auth.shopId, id);
  }

  async replace(auth: AuthContext, id: string, asked: PlanInput): Promise<PourPlanView> {
    await this.ds.transaction(async (m) => {
      const plan = await m.findOne(PourPlan, { where: { id, shopId: auth.shopId }, lock: { mode: 'pessimistic_write' } });
      if (!plan) throw notFound('pour plan');
      const input = await measuredFromFloor(m, auth.shopId, asked, this.moldCavity);
      const { result, snapshot } = await compute(m, auth.shopId, input, this.moldCavity, await shopScale(m, auth.shopId));
      Object.assign(plan, {
        pieceId: input.pieceId,
        moldId: input.cavity.source === 'mold' ? input.cavity.moldId : null,
        name: input.name,
        inputs: input,
        productSnapshot: snapshot,
        result,
      } satisfies Partial<PourPlan>);
      await m.save(plan);
      await recordAudit(m, {
        shopId: auth.shopId,
        actor: auth,
        action: 'pour_plan.update',
        objectType: 'pour_plan',
        objectId: id,
        detail: { name: plan.name },
      });
    });
    return this.get(auth.shopId, id);
  }

  async remove(auth: AuthContext, id: string): Promise<void> {
    await this.ds.transaction(async (m) => {
      const plan = await m.findOneBy(PourPlan, { id, shopId: auth.shopId });
      if (!plan) throw notFound('pour plan');
      await m.delete(PourPlan, { id });
      await recordAudit(m, {
        shopId: auth.shopId,
        actor: auth,
        action: 'pour_plan.delete',
        objectType: 'pour_plan',
        objectId: id,
        detail: { name: plan.name },
      });
    });
  }
}

export type { PourPlanInput };
