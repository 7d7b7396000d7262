import { describe, expect, it } from 'vitest';
import { heightFieldBlock, revolvedPocketBlock } from '../test/moulds';
import { meshOf } from '../test/pipeline';
import { chooseKnots } from './level-knots';
import { buildLevelSeries, hermitePieces, LevelQuantity, seriesFillErrorMm3, seriesValue } from './level-series';
import { triangleBelow } from './triangle-fill';
import { buildTriangleTable, type TriangleTable } from './triangle-table';
import { classifyWetting, type WettingClasses } from './wetting-classes';

/** The fill and wetted sums at h taken triangle by triangle, the slow and obvious way. */
function bruteForce(table: TriangleTable, classes: WettingClasses, h: number): { fill: number; wetted: number } {
  const out = { share: 0, shareSlope: 0, depth: 0 };
  let fill = 0,
    wetted = 0;
  for (let t = 0; t < table.count; t++) {
    triangleBelow(table.sortedZ[3 * t]!, table.sortedZ[3 * t + 1]!, table.sortedZ[3 * t + 2]!, h, false, out);
    if (table.facing[t]! > 0) fill += table.shadowArea[t]! * out.depth;
    if (classes.wet[t]! & 1) wetted += table.area[t]! * out.share;
  }
  return { fill, wetted };
}

function setup(generated: Parameters<typeof meshOf>[0]) {
  const mesh = meshOf(generated);
  const table = buildTriangleTable(mesh.positionsMm, mesh.triangles);
  const classes = classifyWetting(mesh.positionsMm, mesh.triangles, table, mesh.bboxMm);
  return { mesh, table, classes };
}

describe('level series', () => {
  it('reproduces any cubic exactly with Hermite pieces (the defining property of cubic Hermite interpolation)', () => {
    const knots = Float64Array.from([0, 0.7, 2, 5]);
    const p = (h: number): number => 3 - 2 * h + 0.5 * h * h - 0.125 * h * h * h;
    const dp = (h: number): number => -2 + h - 0.375 * h * h;
    const n = knots.length;
    const values = new Float64Array(6 * n),
      slopes = new Float64Array(6 * n);
    knots.forEach((h, k) => {
      values[k] = p(h);
      slopes[k] = dp(h);
    });
    const coefficients = hermitePieces(knots, { valueLeft: values, slopeLeft: slopes, valueRight: values, slopeRight: slopes });
    const series = { knots, coefficients, endValue: new Float64Array(6), endSlope: new Float64Array(6), complete: true, fillPieceErrorMm3: null };
    for (const h of [0.1, 0.7, 1.3, 2.5, 4.99]) expect(seriesValue(series, LevelQuantity.Up, h)).toBeCloseTo(p(h), 12);
  });

  it('is exact when every corner height is a knot: a stepped bowl', () => {
    const profile: [number, number][] = [
      [0, 4],
      [3, 4],
      [3, 7],
      [6, 7],
      [6, 10],
      [9, 12],
    ];
    const { mesh, table, classes } = setup(revolvedPocketBlock({ halfSide: 12, bottomZ: 0, topZ: 12, profile, segments: 48 }));
    const knots = chooseKnots(table, classes, null, mesh.bboxMm.min[2], mesh.bboxMm.max[2], [], 1024);
    expect(knots.complete).toBe(true);
    const series = buildLevelSeries(knots.knots, knots.complete, table, classes, null, mesh.bboxMm.min[2]);
    for (const h of [4, 4.001, 5.5, 7, 8.25, 10, 11.9, 12]) {
      const reference = bruteForce(table, classes, h);
      expect(seriesValue(series, LevelQuantity.Up, h)).toBeCloseTo(reference.fill, 8);
      expect(seriesValue(series, LevelQuantity.Wetted, h)).toBeCloseTo(reference.wetted, 8);
    }
    expect(seriesFillErrorMm3(series, 6)).toBe(0);
  });

  it('stays within its error bound when the knots are evenly spaced: a fine terrain', () => {
    const { mesh, table, classes } = setup(
      heightFieldBlock({
        width: 60,
        depth: 50,
        bottomZ: 0,
        nx: 90,
        ny: 80,
        top: (x, y) => 20 - 6 * Math.sin(x / 9) ** 2 * Math.cos(y / 13) ** 2 - 0.3 * Math.sin(x + y),
      }),
    );
    const knots = chooseKnots(table, classes, null, mesh.bboxMm.min[2], mesh.bboxMm.max[2], [17.5], 64);
    expect(knots.complete).toBe(false);
    expect(Array.from(knots.knots)).toContain(17.5);
    const series = buildLevelSeries(knots.knots, knots.complete, table, classes, null, mesh.bboxMm.min[2]);
    for (let i = 0; i <= 200; i++) {
      const h = 13.5 + (6.5 * i) / 200;
      const reference = bruteForce(table, classes, h);
      const error = Math.abs(seriesValue(series, LevelQuantity.Up, h) - reference.fill);
      expect(error).toBeLessThanOrEqual(seriesFillErrorMm3(series, h) + 1e-9 * reference.fill + 1e-9);
    }
    expect(seriesValue(series, LevelQuantity.Up, 17.5)).toBeCloseTo(bruteForce(table, classes, 17.5).fill, 8);
  });
});
