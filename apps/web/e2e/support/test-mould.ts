type Vec3 = [number, number, number];
type Quad = [Vec3, Vec3, Vec3, Vec3];

export interface PocketBlock {
  /** Outer block, mm: x, y, z (z is up, the underside at z = 0). */
  block: Vec3;
  /** Pocket cut down from the top face, centred, mm. */
  pocket: Vec3;
}

export interface TestMould {
  bytes: Buffer;
  triangleCount: number;
  /** Sum of the signed tetrahedra of the facets with the origin: the solid's volume when closed and wound outward. */
  signedVolumeMm3: number;
}

function cross(a: Vec3, b: Vec3): Vec3 {
  return [a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]];
}

function minus(a: Vec3, b: Vec3): Vec3 {
  return [a[0] - b[0], a[1] - b[1], a[2] - b[2]];
}

/**
 * A wooden blank with a rectangular pocket routed into its top, as a closed, outward-wound binary STL: every quad
 * is listed counter-clockwise as seen from outside the solid.
 */
export function pocketBlockStl({ block: [L, W, H], pocket: [l, w, d] }: PocketBlock): TestMould {
  const x0 = (L - l) / 2;
  const x1 = x0 + l;
  const y0 = (W - w) / 2;
  const y1 = y0 + w;
  const floor = H - d;
  const quads: Quad[] = [
    // Underside and the four outer walls.
    [
      [0, 0, 0],
      [0, W, 0],
      [L, W, 0],
      [L, 0, 0],
    ],
    [
      [0, 0, 0],
      [L, 0, 0],
      [L, 0, H],
      [0, 0, H],
    ],
    [
      [L, 0, 0],
      [L, W, 0],
      [L, W, H],
      [L, 0, H],
    ],
    [
      [L, W, 0],
      [0, W, 0],
      [0, W, H],
      [L, W, H],
    ],
    [
      [0, W, 0],
      [0, 0, 0],
      [0, 0, H],
      [0, W, H],
    ],
    // The top face as a frame around the pocket's opening.
    [
      [0, 0, H],
      [L, 0, H],
      [x1, y0, H],
      [x0, y0, H],
    ],
    [
      [L, 0, H],
      [L, W, H],
      [x1, y1, H],
      [x1, y0, H],
    ],
    [
      [L, W, H],
      [0, W, H],
      [x0, y1, H],
      [x1, y1, H],
    ],
    [
      [0, W, H],
      [0, 0, H],
      [x0, y0, H],
      [x0, y1, H],
    ],
    // The pocket's walls face into the pocket, and its floor faces up.
    [
      [x1, y0, floor],
      [x0, y0, floor],
      [x0, y0, H],
      [x1, y0, H],
    ],
    [
      [x1, y1, floor],
      [x1, y0, floor],
      [x1, y0, H],
      [x1, y1, H],
    ],
    [
      [x0, y1, floor],
      [x1, y1, floor],
      [x1, y1, H],
      [x0, y1, H],
    ],
    [
      [x0, y0, floor],
      [x0, y1, floor],
      [x0, y1, H],
      [x0, y0, H],
    ],
    [
      [x0, y0, floor],
      [x1, y0, floor],
      [x1, y1, floor],
      [x0, y1, floor],
    ],
  ];
  const triangles = quads.flatMap(
    ([a, b, c, e]) =>
      [
        [a, b, c],
        [a, c, e],
      ] as [Vec3, Vec3, Vec3][],
  );
  // Binary STL layout: 80-byte header, uint32 count, then 50 bytes a facet (normal, three vertices, attribute).
  const bytes = Buffer.alloc(84 + 50 * triangles.length);
  bytes.write('gelpoint e2e routed blank', 0, 'latin1');
  bytes.writeUInt32LE(triangles.length, 80);
  let signedVolumeMm3 = 0;
  triangles.forEach(([a, b, c], t) => {
    const n = cross(minus(b, a), minus(c, a));
    const length = Math.hypot(...n);
    const at = 84 + 50 * t;
    [...n.map((v) => v / length), ...a, ...b, ...c].forEach((v, i) => bytes.writeFloatLE(v, at + 4 * i));
    signedVolumeMm3 += (a[0] * (b[1] * c[2] - b[2] * c[1]) - a[1] * (b[0] * c[2] - b[2] * c[0]) + a[2] * (b[0] * c[1] - b[1] * c[0])) / 6;
  });
  return { bytes, triangleCount: triangles.length, signedVolumeMm3 };
}
