import { createHash } from 'node:crypto';
import type { EntityManager } from 'typeorm';
import { buildPourPlan, planCavityFromMold } from '@gelpoint/core';
import { analyzeMouldFile, cavityReport, planCavityFacts, readAnalysis, type CavityModel, type Dam } from '@gelpoint/mesh';
import { Mold, MoldFile, Pigment, Piece, PourPlan, ResinSystem, User } from '../entities';
import { toCorePigment, toCoreResinSystem } from '../shelf-values';
import { demoMouldStl } from './demo-mould';
import { demoPlanLevel } from './demo-mould-level';

export const demoMould = {
  pieceName: 'Burl bowl, void fill',
  name: 'Burl bowl blank, lagoon pocket',
  fileName: 'burl-bowl-lagoon.stl',
  planName: 'Lagoon fill to the rim, smoky teal',
  dam: 'outline' as Dam,
  pigmentPct: 1,
  shopTempC: 21,
};

function valueOf<T>(r: { ok: true; value: T } | { ok: false; error: { code: string; message: string } }): T {
  if (!r.ok) throw new Error(`demo mould: ${r.error.code}: ${r.error.message}`);
  return r.value;
}

/** The plan's cavity from its stored analysis, made as the API makes a mould plan's. */
function planCavity(model: CavityModel, dam: Dam, floorMm: number, frameLevelMm: number) {
  return valueOf(planCavityFromMold(valueOf(planCavityFacts(model, dam, floorMm, frameLevelMm)), frameLevelMm));
}

/**
 * The generated mould stored as an upload stores it, analysed now with the worker's engine so its report is ready at
 * the first sign-in, tied to a piece, and a pour plan made from it.
 */
export async function seedDemoMould(m: EntityManager, shopId: string, people: Map<string, User>): Promise<void> {
  const maker = people.get('maker@gelpoint.test')!;
  const piece = await m.findOneByOrFail(Piece, { shopId, name: demoMould.pieceName });
  const bytes = demoMouldStl();
  const read = valueOf(analyzeMouldFile(bytes, { units: 'mm', up: 'z' }));
  // Stored and read back as the worker and the API do, so the plan comes from what the database holds.
  const storedAnalysis = JSON.parse(JSON.stringify(read.analysis)) as Record<string, unknown>;
  const {
    fillToTop: { depthMap, ...fillToTop },
    ...summary
  } = cavityReport(read.analysis);
  // The depth map is kept apart from the report, as the worker keeps it.
  const report = JSON.parse(JSON.stringify({ ...summary, fillToTop })) as Record<string, unknown>;
  const mold = await m.save(
    m.create(Mold, {
      shopId,
      pieceId: piece.id,
      name: demoMould.name,
      fileName: demoMould.fileName,
      format: read.format,
      units: read.units,
      fileUnits: read.fileUnits,
      upAxis: 'z',
      sizeBytes: bytes.byteLength,
      sha256: createHash('sha256').update(bytes).digest('hex'),
      status: 'ready',
      progress: 1,
      triangleCount: read.analysis.triangles,
      report,
      depthMap: JSON.parse(JSON.stringify(depthMap)) as Record<string, unknown>,
      analysis: storedAnalysis,
      analysedAt: new Date(),
      createdById: maker.id,
    }),
  );
  await m.insert(MoldFile, { moldId: mold.id, bytes: Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength) });

  const deep = await m.findOneByOrFail(ResinSystem, { shopId, use: 'deep_pour' });
  const seal = await m.findOneByOrFail(ResinSystem, { shopId, use: 'coating' });
  const teal = await m.findOneByOrFail(Pigment, { shopId, name: 'Smoky Teal mica' });
  const model = valueOf(readAnalysis(storedAnalysis));
  const level = demoPlanLevel(model, demoMould.dam);
  const planned = planCavity(model, demoMould.dam, level.floorMm, level.frameLevelMm);
  // The plan's own levels start at the floor too: both must name the same surface.
  if (Math.abs(planned.fillLevelMm - level.stored.fillLevelMm) > 1e-6) {
    throw new Error(`demo mould: the plan's fill level ${planned.fillLevelMm} mm above its floor is not the stored ${level.stored.fillLevelMm} mm`);
  }
  const sealCoat = { filmThicknessMm: 0.15, coats: 1, absorptionFactor: 1.3 };
  const snapshot = {
    deepPour: { id: deep.id, ...toCoreResinSystem(deep) },
    pigment: { id: teal.id, ...toCorePigment(teal) },
    sealCoat: { id: seal.id, ...toCoreResinSystem(seal) },
    scaleResolutionG: 0.1 as const,
  };
  const inputs = {
    pieceId: piece.id,
    name: demoMould.planName,
    cavity: { source: 'mold' as const, moldId: mold.id, dam: demoMould.dam },
    ...level.stored,
    deepPour: { resinSystemId: deep.id, pigmentId: teal.id, pigmentPct: demoMould.pigmentPct },
    sealCoat: { resinSystemId: seal.id, ...sealCoat },
    overPourPct: 5,
    cupWaste: { massG: 10 },
    shopTempC: demoMould.shopTempC,
  };
  const result = valueOf(
    buildPourPlan({
      cavity: planned.cavity,
      fillLevelMm: planned.fillLevelMm,
      deepPour: { product: snapshot.deepPour, pigment: { pigment: snapshot.pigment, pct: demoMould.pigmentPct } },
      sealCoat: { product: snapshot.sealCoat, ...sealCoat },
      overPourPct: inputs.overPourPct,
      cupWaste: inputs.cupWaste,
      scaleResolutionG: snapshot.scaleResolutionG,
      shopTempC: inputs.shopTempC,
    }),
  );
  await m.save(
    m.create(PourPlan, {
      shopId,
      pieceId: piece.id,
      moldId: mold.id,
      name: demoMould.planName,
      inputs,
      productSnapshot: snapshot,
      result,
      createdById: maker.id,
    }),
  );
}
