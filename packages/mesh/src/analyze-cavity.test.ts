import { describe, expect, it } from 'vitest';
import { cellSolid, heightFieldBlock, mapped, recessedChamberBlock, revolvedPocketBlock, withoutTriangles, type GeneratedMesh } from '../test/moulds';
import { meshOf, relative, unwrap } from '../test/pipeline';
import { readAnalysis } from './analysis-codec';
import { analyzeCavity } from './analyze-cavity';
import { analyzeStl } from './analyze-stl';
import { curve, fillAt, layerVolumes } from './fill-queries';
import { mmPerUnit } from './frame';
import { prepareMesh } from './prepare-mesh';
import { encodeStlAscii, encodeStlBinary } from './stl/encode-stl';
import { parseStl } from './stl/parse-stl';

const bowl = revolvedPocketBlock({
  halfSide: 25,
  bottomZ: 0,
  topZ: 30,
  profile: Array.from({ length: 25 }, (_, k) => [18 * Math.sin((Math.PI / 2) * (k / 24)), 30 - 18 * Math.cos((Math.PI / 2) * (k / 24))] as [number, number]),
  segments: 96,
});

describe('analyzeCavity: the stored analysis', () => {
  const analysis = unwrap(analyzeCavity(meshOf(bowl), { levelsMm: [20] }));

  it('survives JSON (jsonb) and answers exactly as before, without the mesh', () => {
    const stored = JSON.parse(JSON.stringify(analysis));
    for (const level of [13, 20, 29.5, 34]) {
      for (const dam of ['outline', 'box'] as const) {
        const before = unwrap(fillAt(analysis, level, dam));
        const after = unwrap(fillAt(stored, level, dam));
        if (level === 20) {
          // The level asked for: summed over the faces in the analysing process, read from the
          // stored series (whose knot it is) afterwards; the two differ by rounding only.
          expect(relative(after.volumeMm3, before.volumeMm3)).toBeLessThan(1e-13);
          expect(relative(after.wettedAreaMm2, before.wettedAreaMm2)).toBeLessThan(1e-13);
        } else {
          expect(after.volumeMm3).toBe(before.volumeMm3);
          expect(after.wettedAreaMm2).toBe(before.wettedAreaMm2);
        }
        expect(after.estimatedErrorPct).toBe(before.estimatedErrorPct);
        expect(Array.from(after.depthMap.depthsMm)).toEqual(Array.from(before.depthMap.depthsMm));
      }
    }
    expect(structuredClone(analysis)).toEqual(analysis);
  });

  it('stays within a few MB, for the exact method and for the columns at their finest', () => {
    expect(JSON.stringify(analysis).length).toBeLessThan(4 * 2 ** 20);
    // With a hole in it the undercut mould goes to the columns, which refine to their cap.
    const undercut = withoutTriangles(
      cellSolid(
        [0, 5, 15, 25, 35, 40],
        [0, 5, 15, 25, 35, 40],
        [0, 5, 10, 20],
        (i, j, k) => !((k === 2 && i === 2 && j === 2) || (k === 1 && i >= 1 && i <= 3 && j >= 1 && j <= 3)),
      ),
      [0],
    );
    const columns = unwrap(analyzeCavity(meshOf(undercut), { targetErrorPct: 0.01 }));
    expect(columns.method).toBe('columns');
    expect(JSON.stringify(columns).length).toBeLessThan(5 * 2 ** 20);
  });

  it('is refused with a reason when damaged', () => {
    const broken = { ...analysis, columns: { ...analysis.columns, counts: analysis.columns.counts.slice(0, 40) } };
    const r = readAnalysis(broken);
    expect(r.ok ? '' : r.error.code).toBe('analysis_invalid');
    const notOne = readAnalysis({ hello: 1 });
    expect(notOne.ok ? '' : notOne.error.message).toMatch(/analyse the mould's STL again/);
    const viaFill = fillAt({ ...analysis, version: 3 as never }, 10);
    expect(viaFill.ok ? '' : viaFill.error.code).toBe('analysis_invalid');
  });

  it('answers the same from the arrays it was made from as from its stored form, held air included', () => {
    // A shaft into a chamber whose ceiling has a recess (held air), closed (exact) and with a hole (columns).
    const undercut = recessedChamberBlock();
    for (const mesh of [undercut, withoutTriangles(undercut, [0])]) {
      const made = unwrap(analyzeCavity(meshOf(mesh), { levelsMm: [11] }));
      const stored = JSON.parse(JSON.stringify(made));
      for (const level of [7, 11, 19]) {
        for (const dam of ['outline', 'box'] as const) {
          const fromArrays = unwrap(fillAt(made, level, dam));
          const fromStored = unwrap(fillAt(stored, level, dam));
          expect({ ...fromArrays, depthMap: null }).toEqual({ ...fromStored, depthMap: null });
          expect(Array.from(fromArrays.depthMap.depthsMm)).toEqual(Array.from(fromStored.depthMap.depthsMm));
        }
      }
      expect(unwrap(fillAt(made, 11)).trappedAirMm3).toBeGreaterThan(0);
    }
  });

  it('reads a blob that was replaced as stored, not from the arrays it was made from', () => {
    const made = unwrap(analyzeCavity(meshOf(bowl), { levelsMm: [20] }));
    made.columns = { ...made.columns, counts: made.columns.counts.slice(0, 40) };
    const r = readAnalysis(made);
    expect(r.ok ? '' : r.error.code).toBe('analysis_invalid');
  });

  it('gives the same analysis from a file read in place, whose bytes then hold its triangle table', () => {
    const bytes = encodeStlBinary(bowl);
    const usual = unwrap(analyzeCavity(unwrap(prepareMesh(unwrap(parseStl(bytes)))), { levelsMm: [20] }));
    const consumed = new Uint8Array(bytes);
    const mesh = unwrap(prepareMesh(unwrap(parseStl(consumed, { consumeBytes: true }))));
    expect(mesh.spareMemory?.buffer).toBe(consumed.buffer);
    const first = unwrap(analyzeCavity(mesh, { levelsMm: [20] }));
    // The level asked for was summed without the table: the bytes are still spare.
    expect(mesh.spareMemory?.buffer).toBe(consumed.buffer);
    const firstStored = JSON.parse(JSON.stringify(first)) as unknown;
    // Storing it read the series and the columns, which built the table in the file's bytes.
    expect(mesh.spareMemory).toBeNull();
    expect(Array.from(consumed.subarray(0, 80))).not.toEqual(Array.from(bytes.subarray(0, 80)));
    // A second analysis of the same mesh makes fresh arrays, and leaves the first one's table alone.
    const second = unwrap(analyzeCavity(mesh, { levelsMm: [20] }));
    expect(JSON.parse(JSON.stringify(second))).toEqual(JSON.parse(JSON.stringify(usual)));
    expect(firstStored).toEqual(JSON.parse(JSON.stringify(usual)));
    expect(JSON.parse(JSON.stringify(first))).toEqual(firstStored);
  });

  it('sums up to 8 levels asked for without the table, and leaves more to the series', () => {
    const levels = [10, 12, 14, 16, 18, 20, 22, 24, 26];
    for (const [asked, tableBuilt] of [
      [levels.slice(0, 8), false],
      [levels, true],
    ] as const) {
      const mesh = unwrap(prepareMesh(unwrap(parseStl(encodeStlBinary(bowl), { consumeBytes: true }))));
      const analysis = unwrap(analyzeCavity(mesh, { levelsMm: [...asked] }));
      // The table takes the file's spare bytes when it is built.
      expect(mesh.spareMemory === null).toBe(tableBuilt);
      const stored = JSON.parse(JSON.stringify(analysis)) as typeof analysis;
      expect(relative(unwrap(fillAt(analysis, 20)).volumeMm3, unwrap(fillAt(stored, 20)).volumeMm3)).toBeLessThan(1e-13);
    }
  });

  it('answers many queries from one decoded model', () => {
    const model = unwrap(readAnalysis(analysis));
    expect(unwrap(fillAt(model, 20)).volumeMm3).toBe(unwrap(fillAt(analysis, 20)).volumeMm3);
  });
});

describe('curve and layers', () => {
  const analysis = unwrap(analyzeCavity(meshOf(bowl)));
  const undercut = unwrap(
    analyzeCavity(
      meshOf(
        cellSolid(
          [0, 5, 15, 25, 35, 40],
          [0, 5, 15, 25, 35, 40],
          [0, 5, 10, 20],
          (i, j, k) => !((k === 2 && i === 2 && j === 2) || (k === 1 && i >= 1 && i <= 3 && j >= 1 && j <= 3)),
        ),
      ),
    ),
  );

  it('samples evenly from the lowest to the highest z, matching single fills', () => {
    for (const a of [analysis, undercut]) {
      const points = unwrap(curve(a, 7, 'box'));
      expect(points.map((p) => p.levelMm)).toEqual(Array.from({ length: 7 }, (_, k) => a.bboxMm.min[2] + ((a.bboxMm.max[2] - a.bboxMm.min[2]) * k) / 6));
      for (const p of points) expect(p.volumeMm3).toBeCloseTo(unwrap(fillAt(a, p.levelMm, 'box')).volumeMm3, 6);
    }
    // The fill only grows with the level, under an overhang too: resin flows in beneath it.
    for (const a of [analysis, undercut]) {
      const rising = unwrap(curve(a, 25));
      for (let k = 1; k < rising.length; k++) expect(rising[k]!.volumeMm3).toBeGreaterThanOrEqual(rising[k - 1]!.volumeMm3);
    }
    const given = unwrap(curve(undercut, [20, 8, 25]));
    expect(given.map((p) => p.levelMm)).toEqual([20, 8, 25]);
    expect(given[1]!.volumeMm3).toBeCloseTo(unwrap(fillAt(undercut, 8)).volumeMm3, 6);
  });

  it('splits the fill into layers that add up', () => {
    const levels = [12, 18, 24, 30];
    const layers = unwrap(layerVolumes(analysis, levels));
    expect(layers).toHaveLength(3);
    const total = unwrap(fillAt(analysis, 30)).volumeMm3 - unwrap(fillAt(analysis, 12)).volumeMm3;
    expect(layers.reduce((s, v) => s + v, 0)).toBeCloseTo(total, 6);
    expect(layers[1]).toBeCloseTo(unwrap(fillAt(analysis, 24)).volumeMm3 - unwrap(fillAt(analysis, 18)).volumeMm3, 6);
    const down = layerVolumes(analysis, [20, 10]);
    expect(down.ok ? '' : down.error.code).toBe('levels_not_ascending');
    const few = curve(analysis, 1);
    expect(few.ok ? '' : few.error.code).toBe('level_invalid');
  });
});

describe('units, axes and formats', () => {
  const pocket = cellSolid([0, 6, 26, 32], [0, 4, 20, 24], [0, 5, 12], (i, j, k) => !(i === 1 && j === 1 && k === 1));
  const levelMm = 10;
  const reference = unwrap(fillAt(unwrap(analyzeStl(encodeStlBinary(pocket), { levelsMm: [levelMm] })), levelMm));
  // In mm the pocket holds 20 × 16 × (10 − 5) = 1600 mm³ at 10 mm.
  it('finds the pocket’s volume in mm', () => {
    expect(reference.volumeMm3).toBeCloseTo(1600, 6);
    expect(reference.wettedAreaMm2).toBeCloseTo(20 * 16 + 2 * (20 + 16) * 5, 6);
  });

  it('gives the same millimetre answers from a file in cm or in inches (NIST SP 811: 1 in = 25.4 mm)', () => {
    for (const units of ['cm', 'in'] as const) {
      const scaled: GeneratedMesh = mapped(pocket, (x, y, z) => [x / mmPerUnit[units], y / mmPerUnit[units], z / mmPerUnit[units]]);
      const f = unwrap(fillAt(unwrap(analyzeStl(encodeStlBinary(scaled), { units, levelsMm: [levelMm] })), levelMm));
      expect(relative(f.volumeMm3, reference.volumeMm3)).toBeLessThan(1e-6);
      expect(relative(f.wettedAreaMm2, reference.wettedAreaMm2)).toBeLessThan(1e-6);
    }
  });

  it('gives the same answers for a file with y or x up, once told so', () => {
    // Files written the way such exporters lay them out; the engine turns them back to Z-up.
    const yUp = mapped(pocket, (x, y, z) => [x, z, -y]);
    const xUp = mapped(pocket, (x, y, z) => [z, x, y]);
    for (const [file, up] of [
      [yUp, 'y'],
      [xUp, 'x'],
    ] as const) {
      const analysis = unwrap(analyzeStl(encodeStlBinary(file), { up, levelsMm: [levelMm] }));
      expect(analysis.bboxMm.max[2] - analysis.bboxMm.min[2]).toBeCloseTo(12, 9);
      const f = unwrap(fillAt(analysis, levelMm));
      expect(f.volumeMm3).toBeCloseTo(reference.volumeMm3, 6);
      expect(f.wettedAreaMm2).toBeCloseTo(reference.wettedAreaMm2, 6);
      expect(analysis.warnings).toEqual([]);
    }
  });

  it('gives identical answers for the ASCII and the binary file of one mesh', () => {
    const terrain = heightFieldBlock({ width: 40, depth: 30, bottomZ: 0, nx: 30, ny: 20, top: (x, y) => 15 - 4 * Math.sin(x / 7) * Math.cos(y / 5) });
    const fromBinary = unwrap(analyzeStl(encodeStlBinary(terrain, 'solid terrain')));
    const fromAscii = unwrap(analyzeStl(new TextEncoder().encode(encodeStlAscii(terrain, { lineEnding: '\r\n' }))));
    expect(fromAscii).toEqual(fromBinary);
  });
});

describe('moulds the exact method cannot take', () => {
  it('fills an open top skin (no walls, no base) column by column, close to the closed mould', () => {
    const top = (x: number, y: number): number => 15 - 4 * Math.sin(x / 7) ** 2 * Math.cos(y / 9) ** 2;
    const closed = heightFieldBlock({ width: 40, depth: 30, bottomZ: 0, nx: 40, ny: 30, top });
    // The first 2 × 40 × 30 triangles are the top surface.
    const skin = { positions: closed.positions.slice(0, 9 * 2 * 40 * 30), triangleCount: 2 * 40 * 30 };
    const exact = unwrap(fillAt(unwrap(analyzeCavity(meshOf(closed))), 14));
    const open = unwrap(analyzeCavity(meshOf(skin)));
    expect(open.method).toBe('columns');
    expect(open.warnings.map((w) => w.code)).toContain('open_mesh');
    const f = unwrap(fillAt(open, 14));
    expect(Math.abs(f.volumeMm3 - exact.volumeMm3)).toBeLessThanOrEqual(((f.estimatedErrorPct + exact.estimatedErrorPct) / 100) * exact.volumeMm3);
  });

  it('refuses bad options with a sentence', () => {
    const mesh = meshOf(bowl);
    const r = analyzeCavity(mesh, { targetErrorPct: 0 });
    expect(r.ok ? '' : r.error.code).toBe('option_invalid');
    const l = analyzeCavity(mesh, { levelsMm: [Number.POSITIVE_INFINITY] });
    expect(l.ok ? '' : l.error.code).toBe('level_invalid');
  });
});

describe('analyzeStl: slivers', () => {
  it('keeps the column grid within its budget for a mould 1e20 times longer than it is wide', () => {
    // The grid's aspect once followed the box unchecked, asking for a 2.6e12-column row and
    // throwing a RangeError from inside the worker instead of answering.
    const sliver = cellSolid([0, 1e20], [0, 1], [0, 1], () => true);
    const result = analyzeStl(encodeStlBinary(sliver), { maxColumns: 4096 });
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.value.columns.nx * result.value.columns.ny).toBeLessThanOrEqual(4096);
    // Cuboid V = abc (CRC Concise Encyclopedia of Mathematics), from float32 corners.
    expect(relative(result.value.enclosedVolumeMm3!, Math.fround(1e20))).toBeLessThan(1e-12);
  });
});
