import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { cellSolid, inverted, mapped, type GeneratedMesh } from '../test/moulds';
import { analyzeStl } from './analyze-stl';
import { fillAt } from './fill-queries';
import { mmPerUnit, type FileUnits, type UpAxis } from './frame';
import { encodeStlAscii, encodeStlBinary } from './stl/encode-stl';

type Vec = [number, number, number];
type Rotation = (p: Vec) => Vec;

/** float32 rounds to nearest with a 24-bit significand (IEEE 754-2008 binary32): |error| ≤ 2^-24·|x|. */
const float32Epsilon = 2 ** -24;

/**
 * Bound on what storing the corners as float32 does to a volume: each corner moves by at most
 * √3·2^-24·M (M the largest coordinate), and moving a surface by d changes the enclosed volume
 * by at most d × its area (first order). Twice that, for the second-order terms.
 */
function float32VolumeSlack(largestCoordinate: number, surfaceArea: number): number {
  return 2 * Math.sqrt(3) * float32Epsilon * largestCoordinate * surfaceArea;
}

function largestCoordinate(mesh: GeneratedMesh): number {
  let m = 0;
  for (const v of mesh.positions) m = Math.max(m, Math.abs(v));
  return m;
}

/** Rotation by a unit quaternion (Hamilton): any proper rotation, so winding and volume survive it. */
const rotation: fc.Arbitrary<Rotation> = fc
  .tuple(
    fc.double({ min: -1, max: 1, noNaN: true }),
    fc.double({ min: -1, max: 1, noNaN: true }),
    fc.double({ min: -1, max: 1, noNaN: true }),
    fc.double({ min: -1, max: 1, noNaN: true }),
  )
  .filter(([w, x, y, z]) => Math.hypot(w, x, y, z) > 0.1)
  .map(([w0, x0, y0, z0]) => {
    const n = Math.hypot(w0, x0, y0, z0);
    const w = w0 / n,
      x = x0 / n,
      y = y0 / n,
      z = z0 / n;
    const m = [
      [1 - 2 * (y * y + z * z), 2 * (x * y - w * z), 2 * (x * z + w * y)],
      [2 * (x * y + w * z), 1 - 2 * (x * x + z * z), 2 * (y * z - w * x)],
      [2 * (x * z - w * y), 2 * (y * z + w * x), 1 - 2 * (x * x + y * y)],
    ];
    return (p: Vec): Vec => [0, 1, 2].map((r) => m[r]![0]! * p[0] + m[r]![1]! * p[1] + m[r]![2]! * p[2]) as Vec;
  });

/** A turn about z only: the mould keeps its opening up. */
const yaw: fc.Arbitrary<Rotation> = fc.double({ min: 0, max: 2 * Math.PI, noNaN: true }).map((t) => {
  const c = Math.cos(t),
    s = Math.sin(t);
  return (p: Vec): Vec => [c * p[0] - s * p[1], s * p[0] + c * p[1], p[2]];
});

const side = fc.double({ min: 0.5, max: 500, noNaN: true });
const offset = fc.tuple(
  ...([0, 1, 2].map(() => fc.double({ min: -1000, max: 1000, noNaN: true })) as [fc.Arbitrary<number>, fc.Arbitrary<number>, fc.Arbitrary<number>]),
);
const fileFormat = fc.constantFrom('binary', 'ascii');
const units = fc.constantFrom<FileUnits>('mm', 'cm', 'in');
const upAxis = fc.constantFrom<UpAxis>('x', 'y', 'z');

/** Writes an engine-frame (Z-up) point in a file whose up axis is `up`: the inverse of the engine's turn. */
function toFileFrame(up: UpAxis): Rotation {
  if (up === 'z') return (p) => p;
  if (up === 'y') return ([x, y, z]) => [x, z, -y];
  return ([x, y, z]) => [z, x, y];
}

function placed(mesh: GeneratedMesh, turn: Rotation, shift: Vec, up: UpAxis = 'z'): GeneratedMesh {
  const file = toFileFrame(up);
  return mapped(mesh, (x, y, z) => {
    const r = turn([x, y, z]);
    return file([r[0] + shift[0], r[1] + shift[1], r[2] + shift[2]]);
  });
}

function encoded(mesh: GeneratedMesh, format: string): Uint8Array {
  return format === 'ascii' ? new TextEncoder().encode(encodeStlAscii(mesh)) : encodeStlBinary(mesh);
}

/** A right prism over a regular n-gon of circumradius r, centred on the z axis, closed and outward-wound. */
function regularPrism(n: number, r: number, h: number): GeneratedMesh {
  const data: number[] = [];
  const corner = (k: number, z: number): Vec => [r * Math.cos((2 * Math.PI * (k % n)) / n), r * Math.sin((2 * Math.PI * (k % n)) / n), z];
  const tri = (a: Vec, b: Vec, c: Vec) => data.push(...a, ...b, ...c);
  for (let k = 0; k < n; k++) {
    tri([0, 0, 0], corner(k + 1, 0), corner(k, 0));
    tri([0, 0, h], corner(k, h), corner(k + 1, h));
    tri(corner(k, 0), corner(k + 1, 0), corner(k + 1, h));
    tri(corner(k, 0), corner(k + 1, h), corner(k, h));
  }
  return { positions: Float64Array.from(data), triangleCount: data.length / 9 };
}

describe('closed solids from generated files: the enclosed volume is the closed-form one', () => {
  it('a box a × b × c, turned any way, moved anywhere, wound either way, in any units and either format', () => {
    fc.assert(
      fc.property(side, side, side, rotation, offset, fc.boolean(), fileFormat, units, (a, b, c, turn, shift, insideOut, format, unit) => {
        const box = cellSolid([0, a], [0, b], [0, c], () => true);
        const file = placed(insideOut ? inverted(box) : box, turn, shift);
        const result = analyzeStl(encoded(file, format), { units: unit, maxColumns: 4096 });
        expect(result.ok).toBe(true);
        if (!result.ok) return;
        const scale = mmPerUnit[unit] ** 3;
        // Rectangular parallelepiped: V = abc (CRC Concise Encyclopedia of Mathematics, "Cuboid").
        const expected = a * b * c * scale;
        const slack = float32VolumeSlack(largestCoordinate(file), 2 * (a * b + b * c + c * a)) * scale;
        expect(result.value.watertight).toBe(true);
        expect(Math.abs(result.value.enclosedVolumeMm3! - expected)).toBeLessThanOrEqual(slack);
      }),
      { numRuns: 60 },
    );
  });

  it('a right prism over a regular n-gon, turned and moved', () => {
    const sides = fc.integer({ min: 3, max: 48 });
    fc.assert(
      fc.property(sides, side, side, rotation, offset, fileFormat, (n, r, h, turn, shift, format) => {
        const file = placed(regularPrism(n, r, h), turn, shift);
        const result = analyzeStl(encoded(file, format), { maxColumns: 4096 });
        expect(result.ok).toBe(true);
        if (!result.ok) return;
        // Regular polygon of circumradius r: A = ½·n·r²·sin(2π/n) (CRC Concise Encyclopedia of
        // Mathematics, "Regular Polygon"); a right prism holds V = A·h (Cavalieri's principle).
        const baseArea = 0.5 * n * r * r * Math.sin((2 * Math.PI) / n);
        const perimeter = 2 * n * r * Math.sin(Math.PI / n);
        const slack = float32VolumeSlack(largestCoordinate(file), 2 * baseArea + perimeter * h);
        expect(Math.abs(result.value.enclosedVolumeMm3! - baseArea * h)).toBeLessThanOrEqual(slack);
      }),
      { numRuns: 60 },
    );
  });
});

describe('a block with a rectangular pocket: the fill is length × width × resin depth', () => {
  // Grid lines as running sums of widths, so walls, pocket and floor are each at least 0.5 thick.
  const cut = fc.tuple(side, side, side).map(([p, q, r]): Vec => [p, p + q, p + q + r]);
  const floorAndTop = fc.tuple(side, side).map(([p, q]): [number, number] => [p, p + q]);
  it('at any level in the pocket, for any wall thickness, turn about the up axis, position and up axis of the file', () => {
    fc.assert(
      fc.property(
        cut,
        cut,
        floorAndTop,
        fc.double({ min: 0.05, max: 1, noNaN: true }),
        yaw,
        offset,
        upAxis,
        fileFormat,
        ([x1, x2, xEnd], [y1, y2, yEnd], [floor, top], fraction, turn, shift, up, format) => {
          const block = cellSolid([0, x1, x2, xEnd], [0, y1, y2, yEnd], [0, floor, top], (i, j, k) => !(i === 1 && j === 1 && k === 1));
          const file = placed(block, turn, shift, up);
          const depth = fraction * (top - floor);
          // The level is along the file's up axis, so it is the placed floor plus the resin depth.
          const level = shift[2] + floor + depth;
          const analysis = analyzeStl(encoded(file, format), { up, maxColumns: 4096, levelsMm: [level] });
          expect(analysis.ok).toBe(true);
          if (!analysis.ok) return;
          expect(analysis.value.method).toBe('exact');
          const fill = fillAt(analysis.value, level);
          expect(fill.ok).toBe(true);
          if (!fill.ok) return;
          // A rectangular pocket filled to depth d holds V = l·w·d (CRC, "Cuboid").
          const expected = (x2 - x1) * (y2 - y1) * depth;
          const surface = 2 * (xEnd * yEnd + yEnd * top + top * xEnd) + 2 * (x2 - x1 + y2 - y1) * (top - floor);
          const slack = float32VolumeSlack(largestCoordinate(file), surface);
          expect(Math.abs(fill.value.volumeMm3 - expected)).toBeLessThanOrEqual(slack);
        },
      ),
      { numRuns: 40 },
    );
  });
});
