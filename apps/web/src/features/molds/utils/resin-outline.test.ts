import { describe, expect, it } from 'vitest';
import type { DepthMap } from '../types';
import { resinOutline, resinOutlines, type ResinFootprint } from './resin-outline';

type Point = [number, number, number];

/** Two triangles for a quad a-b-c-d, wound a→b→c, a→c→d. */
const quad = (a: Point, b: Point, c: Point, d: Point): number[] => [...a, ...b, ...c, ...a, ...c, ...d];

/**
 * A 40 × 30 × 10 mm block with a pocket cut into its top: the opening [5, 35] × [5, 25] at z = 10 and the floor
 * [fx0, fx1] × [fy0, fy1] at z = 4. With the floor as large as the opening the walls are upright (a box pocket);
 * with a smaller floor they slope (an upside-down frustum).
 */
function pocketBlock(floor: [number, number, number, number] = [5, 35, 5, 25]): number[] {
  const [fx0, fx1, fy0, fy1] = floor;
  const top = 10;
  const bottom = 4;
  const t: number[] = [];
  // The block's outside: bottom and four walls.
  t.push(...quad([0, 0, 0], [0, 30, 0], [40, 30, 0], [40, 0, 0]));
  t.push(...quad([0, 0, 0], [40, 0, 0], [40, 0, top], [0, 0, top]));
  t.push(...quad([40, 0, 0], [40, 30, 0], [40, 30, top], [40, 0, top]));
  t.push(...quad([40, 30, 0], [0, 30, 0], [0, 30, top], [40, 30, top]));
  t.push(...quad([0, 30, 0], [0, 0, 0], [0, 0, top], [0, 30, top]));
  // The top face around the opening, as four strips.
  t.push(...quad([0, 0, top], [40, 0, top], [40, 5, top], [0, 5, top]));
  t.push(...quad([0, 25, top], [40, 25, top], [40, 30, top], [0, 30, top]));
  t.push(...quad([0, 5, top], [5, 5, top], [5, 25, top], [0, 25, top]));
  t.push(...quad([35, 5, top], [40, 5, top], [40, 25, top], [35, 25, top]));
  // The pocket: four walls from the opening down to the floor, and the floor.
  t.push(...quad([5, 5, top], [35, 5, top], [fx1, fy0, bottom], [fx0, fy0, bottom]));
  t.push(...quad([35, 5, top], [35, 25, top], [fx1, fy1, bottom], [fx1, fy0, bottom]));
  t.push(...quad([35, 25, top], [5, 25, top], [fx0, fy1, bottom], [fx1, fy1, bottom]));
  t.push(...quad([5, 25, top], [5, 5, top], [fx0, fy0, bottom], [fx0, fy1, bottom]));
  t.push(...quad([fx0, fy0, bottom], [fx1, fy0, bottom], [fx1, fy1, bottom], [fx0, fy1, bottom]));
  return t;
}

/** A depth map on 1 mm columns over the block, filled to the brim: each column's resin stands from its floor to z = 10. */
function brimFull(floorAt: (x: number, y: number) => number | null): ResinFootprint {
  const nx = 40;
  const ny = 30;
  const depthsMm: number[] = [];
  for (let j = 0; j < ny; j++) {
    for (let i = 0; i < nx; i++) {
      const floor = floorAt(i + 0.5, j + 0.5);
      depthsMm.push(floor === null ? 0 : 10 - floor);
    }
  }
  const map: DepthMap = { originMm: [0, 0], cellMm: [1, 1], nx, ny, depthsMm };
  return { map, fillLevelMm: 10 };
}

const boxFloor = (x: number, y: number) => (x > 5 && x < 35 && y > 5 && y < 25 ? 4 : null);

function segments(flat: number[]): [number, number, number, number, number, number][] {
  const out: [number, number, number, number, number, number][] = [];
  for (let k = 0; k < flat.length; k += 6) out.push(flat.slice(k, k + 6) as [number, number, number, number, number, number]);
  return out;
}

const length = (flat: number[]) => segments(flat).reduce((sum, [x1, y1, , x2, y2]) => sum + Math.hypot(x2 - x1, y2 - y1), 0);

/** Whether (x, y) lies on the rectangle's edge. */
const onRectangle = (x: number, y: number, [x0, x1, y0, y1]: [number, number, number, number]) =>
  ((Math.abs(x - x0) < 1e-9 || Math.abs(x - x1) < 1e-9) && y >= y0 - 1e-9 && y <= y1 + 1e-9) ||
  ((Math.abs(y - y0) < 1e-9 || Math.abs(y - y1) < 1e-9) && x >= x0 - 1e-9 && x <= x1 + 1e-9);

describe('resinOutline', () => {
  // The plane section of a box pocket between its floor and its rim is its 30 × 20 mm opening: a rectangle, whose
  // perimeter is 2 (a + b) = 100 mm (CRC Concise Encyclopedia of Mathematics).
  it.each([5, 7, 9.5, 10])('draws a box pocket’s section at z = %s mm as its 30 × 20 mm rectangle, and nothing on the block’s outside', (level) => {
    const outline = resinOutline(pocketBlock(), level, brimFull(boxFloor));
    expect(outline.length).toBeGreaterThan(0);
    for (const [x1, y1, z1, x2, y2, z2] of segments(outline)) {
      expect(z1).toBe(level);
      expect(z2).toBe(level);
      expect(onRectangle(x1, y1, [5, 35, 5, 25])).toBe(true);
      expect(onRectangle(x2, y2, [5, 35, 5, 25])).toBe(true);
    }
    expect(length(outline)).toBeCloseTo(100, 9);
  });

  it('draws nothing below the pocket’s floor, where no resin stands', () => {
    expect(resinOutline(pocketBlock(), 3, brimFull(boxFloor))).toEqual([]);
    expect(resinOutline(pocketBlock(), 4, brimFull(boxFloor))).toEqual([]);
  });

  it('does not depend on which way the file winds its triangles', () => {
    const block = pocketBlock();
    const flipped: number[] = [];
    for (let t = 0; t < block.length; t += 9) flipped.push(...block.slice(t, t + 3), ...block.slice(t + 6, t + 9), ...block.slice(t + 3, t + 6));
    expect(length(resinOutline(flipped, 7, brimFull(boxFloor)))).toBeCloseTo(100, 9);
  });

  // An upside-down frustum pocket: the floor [15, 25] × [10, 20] at z = 4, the opening [5, 35] × [5, 25] at z = 10.
  // A plane at the fraction t = (z − 4) / 6 of the way up cuts every sloping wall at the same fraction, so the section
  // is the rectangle [15 − 10t, 25 + 10t] × [10 − 5t, 20 + 5t], perimeter 40 + 60t.
  it('follows sloping walls: the section grows with the level as the walls lean out', () => {
    const floor: [number, number, number, number] = [15, 25, 10, 20];
    const floorAt = (x: number, y: number) => {
      if (!(x > 5 && x < 35 && y > 5 && y < 25)) return null;
      return 4 + 6 * Math.max((15 - x) / 10, (x - 25) / 10, (10 - y) / 5, (y - 20) / 5, 0);
    };
    for (const level of [5.5, 7, 8.5]) {
      const t = (level - 4) / 6;
      const outline = resinOutline(pocketBlock(floor), level, brimFull(floorAt));
      const rect: [number, number, number, number] = [15 - 10 * t, 25 + 10 * t, 10 - 5 * t, 20 + 5 * t];
      for (const [x1, y1, , x2, y2] of segments(outline)) {
        expect(onRectangle(x1, y1, rect)).toBe(true);
        expect(onRectangle(x2, y2, rect)).toBe(true);
      }
      expect(length(outline)).toBeCloseTo(40 + 60 * t, 9);
    }
  });

  it('draws one outline per layer top, each at its own level', () => {
    const outlines = resinOutlines(pocketBlock(), [6, 8, 10], brimFull(boxFloor));
    const levels = segments(outlines).map((s) => s[2]);
    expect(new Set(levels)).toEqual(new Set([6, 8, 10]));
    expect(length(outlines)).toBeCloseTo(300, 9);
  });
});
