import { describe, expect, it } from 'vitest';
import { cellSolid, revolvedSolid } from '../test/moulds';
import { meshOf } from '../test/pipeline';
import { buildColumnGrid } from './column-grid';
import { buildTriangleTable } from './triangle-table';

function grid(generated: Parameters<typeof meshOf>[0], nx: number, ny: number, repair = false) {
  const mesh = meshOf(generated);
  const { min, max } = mesh.bboxMm;
  const table = buildTriangleTable(mesh.positionsMm, mesh.triangles);
  return buildColumnGrid(mesh.positionsMm, mesh.triangles, table, { minX: min[0], minY: min[1], maxX: max[0], maxY: max[1] }, min[2], nx, ny, repair);
}

function solidVolume(g: ReturnType<typeof grid>['grid']): number {
  let sum = 0;
  for (let k = 0; k < g.intervals.length; k += 2) sum += g.intervals[k + 1]! - g.intervals[k]!;
  return sum * g.cellX * g.cellY;
}

describe('column grid', () => {
  it('meets every seam exactly once: a pyramid whose apex and edges run through column centres', () => {
    // A square pyramid on a 10 × 10 base, apex above the centre; 10 columns a side put the apex
    // on a corner of four cells and the diagonal edges through cell centres.
    const pyramid = revolvedSolid(
      [
        [0, 0],
        [5 * Math.SQRT2, 0],
        [0, 6],
      ],
      4,
    );
    const { grid: g, unbalancedColumns } = grid(pyramid, 11, 11);
    expect(unbalancedColumns).toBe(0);
    let pairs = 0;
    for (let c = 0; c < g.nx * g.ny; c++) pairs += g.counts[c]!;
    expect(pairs).toBeGreaterThan(60);
    // CRC: pyramid V = base × height / 3; the column estimate converges to it.
    const fine = grid(pyramid, 400, 400);
    expect(Math.abs(solidVolume(fine.grid) - (10 * 10 * 6) / 3) / 200).toBeLessThan(2e-3);
  });

  it('gives each column of a block one interval, the block’s full height', () => {
    const { grid: g } = grid(
      cellSolid([0, 3, 7, 10], [0, 4, 8], [0, 2, 5], () => true),
      7,
      8,
    );
    for (let c = 0; c < g.nx * g.ny; c++) {
      expect(g.counts[c]).toBe(1);
      expect([g.intervals[2 * g.offsets[c]!], g.intervals[2 * g.offsets[c]! + 1]]).toEqual([0, 5]);
    }
  });

  it('pairs crossings into separate intervals under an overhang', () => {
    // A table: slab 2..3 mm on four legs; columns through the slab away from the legs meet it once.
    const table = cellSolid([0, 1, 9, 10], [0, 1, 9, 10], [0, 2, 3], (i, j, k) => k === 1 || (i !== 1 && j !== 1));
    const { grid: g } = grid(table, 10, 10);
    const centre = 5 * 10 + 5,
      leg = 0;
    expect(g.counts[centre]).toBe(1);
    expect([g.intervals[2 * g.offsets[centre]!], g.intervals[2 * g.offsets[centre]! + 1]]).toEqual([2, 3]);
    expect(g.counts[leg]).toBe(1);
    expect([g.intervals[2 * g.offsets[leg]!], g.intervals[2 * g.offsets[leg]! + 1]]).toEqual([0, 3]);
  });
});
