// A test mould built here from its dimensions: a block with a rectangular pocket open at the top.
// Every face lies on one grid, so each edge is shared by exactly two triangles (a closed mesh).

type V = [number, number, number];

export interface PocketMould {
  outer: [number, number, number];
  /** Pocket rectangle [x0, y0, x1, y1] and its floor height. */
  pocket: [number, number, number, number];
  floorZ: number;
}

function quad(a: V, b: V, c: V, d: V, outward: V): V[][] {
  const u = [b[0] - a[0], b[1] - a[1], b[2] - a[2]];
  const w = [c[0] - a[0], c[1] - a[1], c[2] - a[2]];
  const n = [u[1]! * w[2]! - u[2]! * w[1]!, u[2]! * w[0]! - u[0]! * w[2]!, u[0]! * w[1]! - u[1]! * w[0]!];
  const facing = n[0]! * outward[0] + n[1]! * outward[1] + n[2]! * outward[2];
  return facing >= 0
    ? [
        [a, b, c],
        [a, c, d],
      ]
    : [
        [a, c, b],
        [a, d, c],
      ];
}

export function pocketMouldTriangles(m: PocketMould): V[][] {
  const [X, Y, Z] = m.outer;
  const [x0, y0, x1, y1] = m.pocket;
  const xs = [0, x0, x1, X];
  const ys = [0, y0, y1, Y];
  const t: V[][] = [];
  for (let i = 0; i < 3; i++) {
    for (let j = 0; j < 3; j++) {
      const [a, b, c, d] = [xs[i]!, xs[i + 1]!, ys[j]!, ys[j + 1]!];
      t.push(...quad([a, c, 0], [b, c, 0], [b, d, 0], [a, d, 0], [0, 0, -1]));
      if (!(i === 1 && j === 1)) t.push(...quad([a, c, Z], [b, c, Z], [b, d, Z], [a, d, Z], [0, 0, 1]));
    }
  }
  for (let i = 0; i < 3; i++) {
    const [a, b] = [xs[i]!, xs[i + 1]!];
    t.push(...quad([a, 0, 0], [b, 0, 0], [b, 0, Z], [a, 0, Z], [0, -1, 0]));
    t.push(...quad([a, Y, 0], [b, Y, 0], [b, Y, Z], [a, Y, Z], [0, 1, 0]));
    const [c, d] = [ys[i]!, ys[i + 1]!];
    t.push(...quad([0, c, 0], [0, d, 0], [0, d, Z], [0, c, Z], [-1, 0, 0]));
    t.push(...quad([X, c, 0], [X, d, 0], [X, d, Z], [X, c, Z], [1, 0, 0]));
  }
  const f = m.floorZ;
  t.push(...quad([x0, y0, f], [x1, y0, f], [x1, y1, f], [x0, y1, f], [0, 0, 1]));
  t.push(...quad([x0, y0, f], [x1, y0, f], [x1, y0, Z], [x0, y0, Z], [0, 1, 0]));
  t.push(...quad([x0, y1, f], [x1, y1, f], [x1, y1, Z], [x0, y1, Z], [0, -1, 0]));
  t.push(...quad([x0, y0, f], [x0, y1, f], [x0, y1, Z], [x0, y0, Z], [1, 0, 0]));
  t.push(...quad([x1, y0, f], [x1, y1, f], [x1, y1, Z], [x1, y0, Z], [-1, 0, 0]));
  return t;
}

/** Binary STL: 80-byte header, count, then per triangle a normal, three corners and 2 spare bytes. */
export function binaryStl(triangles: V[][], scale = 1): Buffer {
  const buf = Buffer.alloc(84 + 50 * triangles.length);
  buf.write('gelpoint test mould', 0, 'ascii');
  buf.writeUInt32LE(triangles.length, 80);
  triangles.forEach((tri, k) => {
    let o = 84 + 50 * k + 12;
    for (const v of tri) {
      for (const c of v) {
        buf.writeFloatLE(c * scale, o);
        o += 4;
      }
    }
  });
  return buf;
}
