type Vec3 = [number, number, number];

const minus = (a: Vec3, b: Vec3): Vec3 => [a[0] - b[0], a[1] - b[1], a[2] - b[2]];
const cross = (a: Vec3, b: Vec3): Vec3 => [a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]];

/**
 * A 100 × 60 × 30 mm block with an 80 × 40 × 20 mm pocket in its top, as a closed binary STL wound
 * outward (each quad counter-clockwise seen from outside): the smallest mould that opens the 3D view.
 */
export function pocketBlockStl(): Buffer {
  const quads: [Vec3, Vec3, Vec3, Vec3][] = [
    [[0, 0, 0], [0, 60, 0], [100, 60, 0], [100, 0, 0]],
    [[0, 0, 0], [100, 0, 0], [100, 0, 30], [0, 0, 30]],
    [[100, 0, 0], [100, 60, 0], [100, 60, 30], [100, 0, 30]],
    [[100, 60, 0], [0, 60, 0], [0, 60, 30], [100, 60, 30]],
    [[0, 60, 0], [0, 0, 0], [0, 0, 30], [0, 60, 30]],
    [[0, 0, 30], [100, 0, 30], [90, 10, 30], [10, 10, 30]],
    [[100, 0, 30], [100, 60, 30], [90, 50, 30], [90, 10, 30]],
    [[100, 60, 30], [0, 60, 30], [10, 50, 30], [90, 50, 30]],
    [[0, 60, 30], [0, 0, 30], [10, 10, 30], [10, 50, 30]],
    [[90, 10, 10], [10, 10, 10], [10, 10, 30], [90, 10, 30]],
    [[90, 50, 10], [90, 10, 10], [90, 10, 30], [90, 50, 30]],
    [[10, 50, 10], [90, 50, 10], [90, 50, 30], [10, 50, 30]],
    [[10, 10, 10], [10, 50, 10], [10, 50, 30], [10, 10, 30]],
    [[10, 10, 10], [90, 10, 10], [90, 50, 10], [10, 50, 10]],
  ];
  const triangles = quads.flatMap(([a, b, c, d]) => [[a, b, c], [a, c, d]] as [Vec3, Vec3, Vec3][]);
  const bytes = Buffer.alloc(84 + 50 * triangles.length);
  bytes.write('gelpoint bench pocket block', 0, 'latin1');
  bytes.writeUInt32LE(triangles.length, 80);
  triangles.forEach(([a, b, c], t) => {
    const n = cross(minus(b, a), minus(c, a));
    const length = Math.hypot(...n);
    [...n.map((v) => v / length), ...a, ...b, ...c].forEach((v, i) => bytes.writeFloatLE(v, 84 + 50 * t + 4 * i));
  });
  return bytes;
}
