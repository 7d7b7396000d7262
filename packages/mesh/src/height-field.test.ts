import { describe, expect, it } from 'vitest';
import { cellSolid, combined, mapped, revolvedPocketBlock } from '../test/moulds';
import { meshOf } from '../test/pipeline';
import { checkHeightField } from './height-field';
import { buildTriangleTable } from './triangle-table';

function heightField(generated: Parameters<typeof meshOf>[0]): boolean {
  const mesh = meshOf(generated);
  const { min, max } = mesh.bboxMm;
  const table = buildTriangleTable(mesh.positionsMm, mesh.triangles);
  return checkHeightField(mesh.positionsMm, mesh.triangles, table, { minX: min[0], minY: min[1], maxX: max[0], maxY: max[1] }, max[2] - min[2]).heightField;
}

describe('height-field check', () => {
  it('accepts pockets, bowls and steps', () => {
    expect(heightField(cellSolid([0, 5, 15, 20], [0, 5, 15, 20], [0, 4, 10], (i, j, k) => !(i === 1 && j === 1 && k === 1)))).toBe(true);
    expect(
      heightField(
        revolvedPocketBlock({
          halfSide: 12,
          bottomZ: 0,
          topZ: 10,
          profile: [
            [0, 3],
            [5, 3],
            [9, 10],
          ],
          segments: 32,
        }),
      ),
    ).toBe(true);
  });

  it('accepts an overhang with nothing below it (a mushroom cap beyond the footprint)', () => {
    expect(heightField(cellSolid([0, 5, 10, 15], [0, 5, 10, 15], [0, 6, 9], (i, j, k) => k === 1 || (i === 1 && j === 1)))).toBe(true);
  });

  it('rejects an undercut: a chamber wider than the shaft above it', () => {
    const xs = [0, 5, 15, 25, 35, 40];
    expect(
      heightField(cellSolid(xs, xs, [0, 5, 10, 20], (i, j, k) => !((k === 2 && i === 2 && j === 2) || (k === 1 && i >= 1 && i <= 3 && j >= 1 && j <= 3)))),
    ).toBe(false);
  });

  it('rejects a block floating over another', () => {
    const lower = cellSolid([0, 10], [0, 10], [0, 3], () => true);
    expect(
      heightField(
        combined(
          lower,
          mapped(lower, (x, y, z) => [x + 4, y + 4, z + 5]),
        ),
      ),
    ).toBe(false);
  });

  it('rejects a thin undercut far smaller than any sampling grid would see', () => {
    // A 0.01 mm slot under a lip: found exactly because shadows are intersected, not sampled.
    const xs = [0, 10, 10.01, 30, 40];
    expect(heightField(cellSolid(xs, [0, 40], [0, 5, 6, 12], (i, _j, k) => !((k === 1 && (i === 1 || i === 2)) || (k === 2 && i === 2))))).toBe(false);
  });
});
