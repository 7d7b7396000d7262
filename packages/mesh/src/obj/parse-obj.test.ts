import { describe, expect, it } from 'vitest';
import { objText } from '../../test/mould-files';
import { relative, unwrap } from '../../test/pipeline';
import { analyzeMouldFile } from '../analyze-stl';
import { fillAt } from '../fill-queries';
import { prepareMesh } from '../prepare-mesh';
import { encodeStlBinary } from '../stl/encode-stl';
import { parseObj } from './parse-obj';
import { triangulatePolygon } from './triangulate-polygon';

const text = (s: string): Uint8Array => new TextEncoder().encode(s);

// A five-pointed star, outer radius 20, inner 8, counter-clockwise seen from +z. It is 2n
// triangles from its centre, each with sides Ro and Ri at angle π/n, so by the triangle area
// ½ab sin C (CRC Concise Encyclopedia of Mathematics) its area is n·Ro·Ri·sin(π/n).
const n = 5,
  Ro = 20,
  Ri = 8,
  H = 12;
const starArea = n * Ro * Ri * Math.sin(Math.PI / n);
const star: [number, number][] = Array.from({ length: 2 * n }, (_, k) => {
  const rho = k % 2 === 0 ? Ro : Ri,
    phi = (Math.PI * k) / n;
  return [rho * Math.cos(phi), rho * Math.sin(phi)];
});

/** The star extruded from z = 0 to H: two concave 10-gon caps and ten quad sides. */
function starPrismObj(options: Parameters<typeof objText>[2] = {}): string {
  const vertices = [...star.map(([x, y]) => [x, y, 0]), ...star.map(([x, y]) => [x, y, H])];
  const m = star.length;
  const faces = [
    Array.from({ length: m }, (_, k) => m - 1 - k), // bottom, seen from below counter-clockwise
    Array.from({ length: m }, (_, k) => m + k),
    ...Array.from({ length: m }, (_, k) => [k, (k + 1) % m, m + ((k + 1) % m), m + k]),
  ];
  return objText(vertices, faces, options);
}

/** The same prism as an STL whose caps are fans from the star's centre, which lies inside it. */
function starPrismStl(): Uint8Array {
  const data: number[] = [];
  const m = star.length;
  for (let k = 0; k < m; k++) {
    const [ax, ay] = star[k]!,
      [bx, by] = star[(k + 1) % m]!;
    data.push(0, 0, H, ax, ay, H, bx, by, H);
    data.push(0, 0, 0, bx, by, 0, ax, ay, 0);
    data.push(ax, ay, 0, bx, by, 0, bx, by, H, ax, ay, 0, bx, by, H, ax, ay, H);
  }
  return encodeStlBinary({ positions: Float64Array.from(data), triangleCount: data.length / 9 });
}

/** Sum of |area| and of signed area along +z of triangles given by corner numbers into a flat 3D list. */
function areas(vertices: Float64Array, triangles: number[], normal: [number, number, number]) {
  let unsigned = 0,
    signed = 0;
  for (let t = 0; t < triangles.length; t += 3) {
    const [a, b, c] = [triangles[t]!, triangles[t + 1]!, triangles[t + 2]!].map((i) => [vertices[3 * i]!, vertices[3 * i + 1]!, vertices[3 * i + 2]!]);
    const u = [b![0]! - a![0]!, b![1]! - a![1]!, b![2]! - a![2]!],
      v = [c![0]! - a![0]!, c![1]! - a![1]!, c![2]! - a![2]!];
    const cross = [u[1]! * v[2]! - u[2]! * v[1]!, u[2]! * v[0]! - u[0]! * v[2]!, u[0]! * v[1]! - u[1]! * v[0]!];
    unsigned += Math.hypot(...cross) / 2;
    signed += (cross[0]! * normal[0] + cross[1]! * normal[1] + cross[2]! * normal[2]) / 2;
  }
  return { unsigned, signed };
}

describe('triangulatePolygon: concave faces split without overlap, keeping their winding', () => {
  it('splits the star into 8 triangles covering exactly its area', () => {
    const vertices = Float64Array.from(star.flatMap(([x, y]) => [x, y, 0]));
    const out: number[] = [];
    triangulatePolygon(
      vertices,
      star.map((_, k) => k),
      out,
    );
    expect(out.length).toBe(3 * (star.length - 2));
    const a = areas(vertices, out, [0, 0, 1]);
    // Overlapping or folded triangles would make |area| exceed the signed area.
    expect(a.unsigned).toBeCloseTo(starArea, 9);
    expect(a.signed).toBeCloseTo(starArea, 9);
  });

  it('splits a concave quad at its reflex corner, whichever corner the face starts at', () => {
    // (4,0) (1,1) (0,4) (0,0): reflex at (1,1). A fan from (4,0) would fold. Shoelace area = 4.
    const vertices = Float64Array.of(4, 0, 0, 1, 1, 0, 0, 4, 0, 0, 0, 0);
    const out: number[] = [];
    triangulatePolygon(vertices, [0, 1, 2, 3], out);
    const a = areas(vertices, out, [0, 0, 1]);
    expect(a.unsigned).toBeCloseTo(4, 12);
    expect(a.signed).toBeCloseTo(4, 12);
  });

  it('works in any plane: the star tilted and turned, faces still along the polygon’s normal', () => {
    const tilt = 0.7,
      turn = 1.9;
    // Rotation about x by tilt, then about z by turn (linear algebra): the normal (0,0,1) maps to w.
    const rotate = ([x, y, z]: number[]): number[] => {
      const y1 = y! * Math.cos(tilt) - z! * Math.sin(tilt),
        z1 = y! * Math.sin(tilt) + z! * Math.cos(tilt);
      return [x! * Math.cos(turn) - y1 * Math.sin(turn), x! * Math.sin(turn) + y1 * Math.cos(turn), z1 + 5];
    };
    const w = rotate([0, 0, 1]).map((v, i) => v - [0, 0, 5][i]!) as [number, number, number];
    const vertices = Float64Array.from(star.flatMap(([x, y]) => rotate([x, y, 0])));
    const out: number[] = [];
    triangulatePolygon(
      vertices,
      star.map((_, k) => k),
      out,
    );
    const a = areas(vertices, out, w);
    expect(a.unsigned).toBeCloseTo(starArea, 9);
    expect(a.signed).toBeCloseTo(starArea, 9);
  });

  it('falls back to a fan for a face with no area', () => {
    const vertices = Float64Array.of(0, 0, 0, 1, 0, 0, 2, 0, 0, 3, 0, 0);
    const out: number[] = [];
    triangulatePolygon(vertices, [0, 1, 2, 3], out);
    expect(out).toEqual([0, 1, 2, 0, 2, 3]);
  });
});

describe('parseObj: a concave prism gives the volume and the fill of its STL', () => {
  it('encloses the star’s area times its height', () => {
    const mesh = unwrap(prepareMesh(unwrap(parseObj(text(starPrismObj())))));
    expect(mesh.topology.watertight).toBe(true);
    expect(relative(mesh.enclosedVolumeMm3!, starArea * H)).toBeLessThan(1e-6);
  });

  it('fills a box dam around it as the STL does, at every level (box area × L − star area × L)', () => {
    const obj = unwrap(analyzeMouldFile(text(starPrismObj({ negative: true, corner: 'v//vn', lineEnding: '\r\n' })))).analysis;
    const stl = unwrap(analyzeMouldFile(starPrismStl())).analysis;
    const { min, max } = stl.bboxMm;
    const boxArea = (max[0] - min[0]) * (max[1] - min[1]);
    for (const level of [1, 6, 11.5]) {
      const viaObj = unwrap(fillAt(obj, level, 'box')).volumeMm3;
      const viaStl = unwrap(fillAt(stl, level, 'box')).volumeMm3;
      expect(relative(viaObj, viaStl)).toBeLessThan(1e-9);
      expect(relative(viaObj, (boxArea - starArea) * level)).toBeLessThan(1e-6);
    }
  });
});

describe('parseObj: the grammar shops meet', () => {
  const read = (s: string) => parseObj(text(s));
  const triangle = 'v 0 0 0\nv 1 0 0\nv 0 1 0\n';

  it('takes comments, groups, objects, smoothing, materials, vertex colours and w', () => {
    const r = unwrap(
      read(
        `# a\r\nmtllib a.mtl\r\no part\r\ng one two\r\ns 1\r\nv 0 0 0 1\r\nv 1 0 0 0.5 0.2 0.1\r\nv 0 1 0\r\nvt 0 0\r\nvn 0 0 1\r\nusemtl oak\r\nf 1/1/1 2/1/1 3/1/1 # tail comment\r\nl 1 2\r\np 1\r\n`,
      ),
    );
    expect(r.triangleCount).toBe(1);
    expect(Array.from(r.positions)).toEqual([0, 0, 0, 1, 0, 0, 0, 1, 0]);
  });

  it('counts negative corners back from the latest vertex, at the line where they stand', () => {
    const r = unwrap(read(`${triangle}f -3 -2 -1\nv 5 5 5\nf -4 -3 -1\n`));
    expect(Array.from(r.positions.subarray(9))).toEqual([0, 0, 0, 1, 0, 0, 5, 5, 5]);
  });

  it('accepts faces that name vertices written after them', () => {
    expect(unwrap(read('f 1 2 3\nv 0 0 0\nv 1 0 0\nv 0 1 0\n')).triangleCount).toBe(1);
  });

  it('joins a line ending in a backslash with the next', () => {
    expect(unwrap(read(`${triangle}v 1 1 0\nf 1 2 \\\n 4 3\n`)).triangleCount).toBe(2);
  });

  const refusals: [string, string, string, RegExp][] = [
    ['corner 0', `${triangle}f 0 1 2\n`, 'obj_invalid', /^Line 4 of the OBJ has the face corner "0"/],
    ['a corner past the last vertex', `${triangle}f 1 2 4\n`, 'obj_invalid', /^Line 4 of the OBJ uses vertex 4, but the file has only 3 vertices/],
    ['a negative corner before the first vertex', `${triangle}f -1 -2 -4\n`, 'obj_invalid', /face corner -4, but only 3 vertices come before it/],
    ['a face of two corners', `${triangle}f 1 2\n`, 'obj_invalid', /face with 2 corners; a face needs at least three/],
    ['a coordinate that is not a number', 'v 0 zero 0\n', 'obj_invalid', /^Line 1 of the OBJ has the coordinate "zero"/],
    ['a vertex of two numbers', 'v 0 0\n', 'obj_invalid', /fewer than three coordinates/],
    ['an infinite coordinate', 'v 0 1e39 0\n', 'obj_invalid', /beyond the ±3.4e38/],
    ['a point cloud', triangle, 'obj_no_faces', /3 vertices but no faces/],
    ['free-form surfaces', 'v 0 0 0\ncstype bspline\ndeg 3\nsurf 0 1 0 1 1 1 1 1\nend\n', 'obj_no_faces', /free-form curves and surfaces/],
  ];
  for (const [name, body, code, message] of refusals) {
    it(`refuses ${name} with a sentence`, () => {
      const r = read(body);
      expect(r.ok ? '' : r.error.code).toBe(code);
      expect(r.ok ? '' : r.error.message).toMatch(message);
      expect(r.ok ? '' : r.error.message).toMatch(/; .+\.$/);
    });
  }

  it('reads in time proportional to its length: 200,000 lines in a few seconds at most', () => {
    // A scan from each line to the end of the file would take minutes here.
    const rows = 250;
    const lines: string[] = [];
    for (let j = 0; j <= rows; j++) for (let i = 0; i <= rows; i++) lines.push(`v ${i} ${j} ${(i * j) % 7}`);
    for (let j = 0; j < rows; j++) {
      for (let i = 0; i < rows; i++) {
        const a = j * (rows + 1) + i + 1;
        lines.push(`f ${a} ${a + 1} ${a + rows + 2} ${a + rows + 1}`);
      }
    }
    const bytes = text(lines.join('\n'));
    const start = performance.now();
    const r = unwrap(parseObj(bytes));
    expect(performance.now() - start).toBeLessThan(5000);
    expect(r.triangleCount).toBe(2 * rows * rows);
  });

  it('refuses more triangles than the cap, counting what polygons become', () => {
    const quad = 'v 0 0 0\nv 1 0 0\nv 1 1 0\nv 0 1 0\nf 1 2 3 4\n';
    expect(unwrap(parseObj(text(quad), { maxTriangles: 2 })).triangleCount).toBe(2);
    const r = parseObj(text(quad), { maxTriangles: 1 });
    expect(r.ok ? '' : r.error.code).toBe('too_many_triangles');
  });
});
