import { createHash } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DataSource } from 'typeorm';
import { PourPlanResult } from '@gelpoint/contracts';
import type { PourPlan as CorePourPlan } from '@gelpoint/core';
import type { CavityReportRecord, DepthMapRecord } from '@gelpoint/mesh';
import { loadManifold, outlineDamResin, wettedAreaOf, type ManifoldKernel } from '../../../mesh/test/manifold-reference';
import { readBinaryStlIndexed, type IndexedStl } from '../../../mesh/test/stl-indexed';
import { createDataSource } from '../data-source';
import { Membership, Mold, Piece, PourPlan, Shop, User } from '../entities';
import { verifyPassword } from '../passwords';
import { DEMO_PASSWORD, demoSignIns, seedDemo } from './demo';
import { demoMouldStl } from './demo-mould';

// npm test seeds the e2e database with the real seed command before the tests run.
let ds: DataSource;
beforeAll(async () => {
  const url = process.env.GELPOINT_E2E_DATABASE_URL;
  if (!url) throw new Error('GELPOINT_E2E_DATABASE_URL is not set: run the tests through npm test');
  ds = createDataSource({ url, poolSize: 2 });
  await ds.initialize();
});
afterAll(() => ds?.destroy());

describe('demo scenario', () => {
  it('holds one shop with a lead, a maker and an apprentice who can sign in with the demo password', async () => {
    const shops = await ds.getRepository(Shop).find();
    expect(shops).toHaveLength(1);
    for (const d of demoSignIns) {
      const user = await ds.getRepository(User).findOneByOrFail({ email: d.email });
      expect(await verifyPassword(DEMO_PASSWORD, user.passwordHash)).toBe(true);
      const m = await ds.getRepository(Membership).findOneByOrFail({ userId: user.id, shopId: shops[0]!.id });
      expect(m.role).toBe(d.role);
    }
    expect(demoSignIns.map((d) => d.role).sort()).toEqual(['apprentice', 'lead', 'maker']);
  });

  it('has pieces at several different stages', async () => {
    const pieces = await ds.getRepository(Piece).find();
    expect(new Set(pieces.map((p) => p.stage)).size).toBeGreaterThanOrEqual(4);
  });

  it('stocks the shelf with products, pigments and lots, one of them expired and one low', async () => {
    const resins: { use: string }[] = await ds.query('SELECT use FROM resin_systems');
    expect(new Set(resins.map((r) => r.use))).toEqual(new Set(['deep_pour', 'coating', 'casting']));
    const lots: { expired: boolean; low: boolean }[] = await ds.query(
      'SELECT expires_on < CURRENT_DATE AS expired, remaining_g < quantity_g * 0.1 AS low FROM lots',
    );
    expect(lots.some((l) => l.expired)).toBe(true);
    expect(lots.some((l) => l.low)).toBe(true);
  });

  it('has a pour whose demold check is already due, and a piece cured enough to release', async () => {
    // Seeded pending; the browser tests' worker may have mailed it already, so sent counts too.
    const due: { kind: string; title: string }[] = await ds.query(
      `SELECT kind, title FROM reminders WHERE due_at <= now() AND (status = 'pending' OR (status = 'sent' AND sent_at > due_at))`,
    );
    expect(due.map((r) => r.kind)).toEqual(['demold_check']);
    expect(due[0]!.title).toContain('River table');
    const ready: { n: number }[] = await ds.query(`SELECT count(*)::int AS n FROM reminders WHERE kind = 'ready_to_machine' AND status = 'sent'`);
    expect(ready[0]!.n).toBe(1);
  });

  it('does nothing when run again', async () => {
    const before = await ds.getRepository(User).count();
    const [moulds, plans] = [await ds.getRepository(Mold).count(), await ds.getRepository(PourPlan).count()];
    expect(await seedDemo(ds)).toBe(false);
    expect(await ds.getRepository(User).count()).toBe(before);
    expect(await ds.getRepository(Shop).count()).toBe(1);
    expect(await ds.getRepository(Mold).count()).toBe(moulds);
    expect(await ds.getRepository(PourPlan).count()).toBe(plans);
  });
});

describe('the demo mould', () => {
  let mold: Mold;
  let bytes: Buffer;
  let report: CavityReportRecord;
  let stl: IndexedStl;
  let kernel: ManifoldKernel;
  // The reference: manifold-3d, an outside geometry kernel, fills the very bytes stored, read by a reader of their own.
  const reference = (levelMm: number) => {
    const resin = outlineDamResin(kernel, stl, levelMm);
    const figures = { volumeMm3: resin.volume(), wettedAreaMm2: wettedAreaOf(resin, levelMm) };
    resin.delete();
    return figures;
  };
  const relative = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

  beforeAll(async () => {
    // The browser tests may add moulds of their own to this database; the demo's is the one the seed made.
    mold = await ds.getRepository(Mold).findOneOrFail({ where: { fileName: 'burl-bowl-lagoon.stl' }, relations: { piece: true } });
    const [file] = (await ds.query('SELECT bytes FROM mold_files WHERE mold_id = $1', [mold.id])) as [{ bytes: Buffer }];
    bytes = file.bytes;
    report = mold.report as unknown as CavityReportRecord;
    stl = readBinaryStlIndexed(new Uint8Array(bytes));
    kernel = await loadManifold();
  });

  it('is stored as an upload is: the generated file with its hash, size, format and units, tied to a piece', () => {
    expect(bytes.equals(Buffer.from(demoMouldStl()))).toBe(true);
    expect(mold.sha256).toBe(createHash('sha256').update(bytes).digest('hex'));
    expect(mold.sizeBytes).toBe(bytes.byteLength);
    expect([mold.format, mold.units, mold.fileUnits, mold.upAxis]).toEqual(['stl', 'mm', null, 'z']);
    expect(mold.piece?.name).toBe('Burl bowl, void fill');
  });

  it('is analysed and ready at the first sign-in: watertight, by the exact method, with its depth map', () => {
    expect(mold.status).toBe('ready');
    expect(mold.analysedAt).not.toBeNull();
    expect(mold.analysis).not.toBeNull();
    expect(report.watertight).toBe(true);
    expect(report.method).toBe('exact');
    expect(report.warnings).toEqual([]);
    expect(report.triangles).toBe(stl.triangles.length / 3);
    expect(mold.triangleCount).toBe(report.triangles);
    // The deepest resin stands on the file's lowest floor corner (z = 20 mm) under the top face (z = 60 mm).
    expect(report.fillToTop).not.toHaveProperty('depthMap');
    const map = mold.depthMap as unknown as DepthMapRecord;
    expect(map.nx * map.ny).toBe(map.depthsMm.length);
    expect(report.fillToTop.maxDepthMm).toBeCloseTo(60 - 20, 9);
    expect(Math.max(...map.depthsMm)).toBeLessThanOrEqual(40);
    // The pocket's floor is no shallower than 10 mm anywhere, so every wet cell of the map is at least that deep.
    expect(Math.min(...map.depthsMm.filter((d) => d > 0))).toBeGreaterThanOrEqual(10);
  });

  it('fills to the same volume and wetted area as manifold-3d, at the top and along its curve, within 0.01 %', () => {
    const top = reference(60);
    expect(relative(report.fillToTop.volumeMm3, top.volumeMm3)).toBeLessThan(1e-4);
    expect(relative(report.fillToTop.wettedAreaMm2, top.wettedAreaMm2)).toBeLessThan(1e-4);
    const inside = report.curve.filter((p) => p.levelMm > 21 && p.levelMm < 60);
    expect(inside.length).toBeGreaterThan(10);
    for (const p of [inside[0]!, inside[Math.floor(inside.length / 2)]!, inside[inside.length - 1]!]) {
      expect(relative(p.volumeMm3, reference(p.levelMm).volumeMm3)).toBeLessThan(1e-4);
    }
    // Below the floor (z = 20 mm) nothing is held.
    expect(report.curve.filter((p) => p.levelMm <= 20).every((p) => p.volumeMm3 === 0)).toBe(true);
  });

  it('has a pour plan made from it: sealed, filled to the rim, its layers and seal coat consistent with the curve', async () => {
    const plan = await ds.getRepository(PourPlan).findOneByOrFail({ moldId: mold.id });
    const inputs = plan.inputs as {
      cavity: unknown;
      fillLevelMm: number;
      levelFrom: string;
      sealCoat: { filmThicknessMm: number; coats: number; absorptionFactor: number };
    };
    expect(plan.pieceId).toBe(mold.pieceId);
    expect(inputs.cavity).toEqual({ source: 'mold', moldId: mold.id, dam: 'outline' });
    // The level is stored with its datum: the rim (z = 60 mm) above the floor (z = 20 mm, the file's lowest floor corner).
    expect(inputs.levelFrom).toBe('floor');
    expect(inputs.fillLevelMm).toBeCloseTo(60 - 20, 9);
    const result: CorePourPlan = PourPlanResult.parse(plan.result);
    const frameLevelMm = 20 + inputs.fillLevelMm;
    const top = reference(frameLevelMm);
    const curveTop = report.curve[report.curve.length - 1]!;
    expect(curveTop.levelMm).toBe(frameLevelMm);
    // The plan's fill is the curve's volume at its level, and manifold-3d's, within 0.01 % (and the 0.05 mL it is shown to).
    const tolerance = (ml: number) => Math.max(ml * 1e-4, 0.05);
    expect(Math.abs(result.fill.fillVolumeMl - curveTop.volumeMm3 / 1000)).toBeLessThanOrEqual(tolerance(curveTop.volumeMm3 / 1000));
    expect(Math.abs(result.fill.fillVolumeMl - top.volumeMm3 / 1000)).toBeLessThanOrEqual(tolerance(top.volumeMm3 / 1000));
    // Fewest equal layers no thicker than the product allows: ⌈40 / 50⌉ = 1 layer of 40 mm, from the floor to the rim.
    const maxLayerMm = (plan.productSnapshot as { deepPour: { maxLayerMm: number } }).deepPour.maxLayerMm;
    expect(result.layers).toHaveLength(Math.ceil(inputs.fillLevelMm / maxLayerMm));
    expect(result.layers[0]!.fromLevelMm).toBe(0);
    expect(result.layers.at(-1)!.toLevelMm).toBeCloseTo(inputs.fillLevelMm, 9);
    const layersMl = result.layers.reduce((sum, l) => sum + l.fillVolumeMl, 0);
    expect(Math.abs(layersMl - top.volumeMm3 / 1000)).toBeLessThanOrEqual(tolerance(top.volumeMm3 / 1000));
    // Seal coat = wetted area × film thickness × coats × absorption factor (common practice), the area from manifold-3d.
    const s = inputs.sealCoat;
    const sealMl = (top.wettedAreaMm2 * s.filmThicknessMm * s.coats * s.absorptionFactor) / 1000;
    expect(result.sealCoat).not.toBeNull();
    expect(Math.abs(result.sealCoat!.volumeMl - sealMl)).toBeLessThanOrEqual(tolerance(sealMl));
  });
});
