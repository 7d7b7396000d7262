/**
 * Closed, outward-wound test moulds built from exact geometry, so every test knows the true
 * answer of the very mesh it feeds the engine. Shared by the tests and the benchmark.
 */
export interface GeneratedMesh {
  /** Nine coordinates per triangle. */
  positions: Float64Array;
  triangleCount: number;
}

class MeshWriter {
  private data: number[] = [];
  triangle(a: readonly number[], b: readonly number[], c: readonly number[]): void {
    this.data.push(a[0]!, a[1]!, a[2]!, b[0]!, b[1]!, b[2]!, c[0]!, c[1]!, c[2]!);
  }
  /** Quad a-b-c-d, counter-clockwise seen from outside. */
  quad(a: readonly number[], b: readonly number[], c: readonly number[], d: readonly number[]): void {
    this.triangle(a, b, c);
    this.triangle(a, c, d);
  }
  done(): GeneratedMesh {
    return { positions: Float64Array.from(this.data), triangleCount: this.data.length / 9 };
  }
}

/** Same triangles, every one wound the other way (normals into the solid). */
export function inverted(mesh: GeneratedMesh): GeneratedMesh {
  const p = mesh.positions.slice();
  for (let t = 0; t < mesh.triangleCount; t++) {
    for (let k = 0; k < 3; k++) {
      const s = p[9 * t + 3 + k]!;
      p[9 * t + 3 + k] = p[9 * t + 6 + k]!;
      p[9 * t + 6 + k] = s;
    }
  }
  return { positions: p, triangleCount: mesh.triangleCount };
}

/** The mesh without the listed triangles (makes holes). */
export function withoutTriangles(mesh: GeneratedMesh, drop: number[]): GeneratedMesh {
  const keep: number[] = [];
  for (let t = 0; t < mesh.triangleCount; t++) {
    if (!drop.includes(t)) for (let k = 0; k < 9; k++) keep.push(mesh.positions[9 * t + k]!);
  }
  return { positions: Float64Array.from(keep), triangleCount: keep.length / 9 };
}

/** Several meshes as one soup. */
export function combined(...meshes: GeneratedMesh[]): GeneratedMesh {
  const parts = meshes.map((m) => Array.from(m.positions));
  const all = parts.flat();
  return { positions: Float64Array.from(all), triangleCount: all.length / 9 };
}

/** Maps every point through f (f must be a proper rotation/translation to keep the winding). */
export function mapped(mesh: GeneratedMesh, f: (x: number, y: number, z: number) => [number, number, number]): GeneratedMesh {
  const p = new Float64Array(mesh.positions.length);
  for (let v = 0; v < mesh.positions.length / 3; v++) {
    const [x, y, z] = f(mesh.positions[3 * v]!, mesh.positions[3 * v + 1]!, mesh.positions[3 * v + 2]!);
    p[3 * v] = x;
    p[3 * v + 1] = y;
    p[3 * v + 2] = z;
  }
  return { positions: p, triangleCount: mesh.triangleCount };
}

export interface RevolvedPocketBlock {
  /** Half the side of the square block, centred on the z axis. */
  halfSide: number;
  bottomZ: number;
  topZ: number;
  /**
   * The pocket's profile as [radius, z] from the floor centre (radius 0) out to the rim, whose
   * z must be topZ. Each point becomes a ring of `segments` vertices.
   */
  profile: [number, number][];
  /** Around the axis; a multiple of 8 so the square's corners fall on ring directions. */
  segments: number;
}

/**
 * A square block with a pocket of revolution cut into its top (bowl, cylinder, frustum). Every
 * pocket ring is a regular polygon inscribed in the true circle, so the pocket is a stack of
 * polygonal frusta whose volume and area have closed forms.
 */
export function revolvedPocketBlock(spec: RevolvedPocketBlock): GeneratedMesh {
  const { halfSide: L, bottomZ, topZ, profile, segments: n } = spec;
  if (n % 8 !== 0) throw new Error('segments must be a multiple of 8');
  const w = new MeshWriter();
  const ring = (k: number, j: number): number[] => {
    const [r, z] = profile[k]!;
    const phi = (2 * Math.PI * (j % n)) / n;
    return [r * Math.cos(phi), r * Math.sin(phi), z];
  };
  const square = (j: number, z: number): number[] => {
    const phi = (2 * Math.PI * (j % n)) / n;
    const c = Math.cos(phi),
      s = Math.sin(phi);
    const scale = L / Math.max(Math.abs(c), Math.abs(s));
    // Snap the corners and axis points onto the exact square so faces stay planar.
    const x = Math.abs(Math.abs(c * scale) - L) < 1e-12 * L ? Math.sign(c) * L : c * scale;
    const y = Math.abs(Math.abs(s * scale) - L) < 1e-12 * L ? Math.sign(s) * L : s * scale;
    return [x, y, z];
  };
  const pole = [0, 0, profile[0]![1]];
  for (let j = 0; j < n; j++) w.triangle(pole, ring(1, j), ring(1, j + 1));
  for (let k = 1; k + 1 < profile.length; k++) {
    for (let j = 0; j < n; j++) w.quad(ring(k, j), ring(k + 1, j), ring(k + 1, j + 1), ring(k, j + 1));
  }
  const rim = profile.length - 1;
  for (let j = 0; j < n; j++) {
    w.quad(ring(rim, j), square(j, topZ), square(j + 1, topZ), ring(rim, j + 1));
    w.quad(square(j, topZ), square(j, bottomZ), square(j + 1, bottomZ), square(j + 1, topZ));
    w.triangle([0, 0, bottomZ], square(j + 1, bottomZ), square(j, bottomZ));
  }
  return w.done();
}

/**
 * A solid of revolution from a closed profile given as [radius, z] points, walked counter-clockwise
 * around the solid's cross-section (radius to the right, z up) from one point on the axis to
 * another, e.g. a round tray: [0, 0] → [R, 0] → [R, H] → [r, H] → [r, f] → [0, f].
 */
export function revolvedSolid(profile: [number, number][], segments: number): GeneratedMesh {
  const n = segments;
  const w = new MeshWriter();
  const at = (k: number, j: number): number[] => {
    const [r, z] = profile[k]!;
    const phi = (2 * Math.PI * (j % n)) / n;
    return r === 0 ? [0, 0, z] : [r * Math.cos(phi), r * Math.sin(phi), z];
  };
  for (let k = 0; k + 1 < profile.length; k++) {
    const r0 = profile[k]![0],
      r1 = profile[k + 1]![0];
    for (let j = 0; j < n; j++) {
      if (r0 === 0) w.triangle(at(k, j), at(k + 1, j + 1), at(k + 1, j));
      else if (r1 === 0) w.triangle(at(k, j), at(k, j + 1), at(k + 1, j));
      else w.quad(at(k, j), at(k, j + 1), at(k + 1, j + 1), at(k + 1, j));
    }
  }
  return w.done();
}

export interface HeightFieldBlock {
  width: number;
  depth: number;
  bottomZ: number;
  /** Grid cells along x and y; the top gets 2 × nx × ny triangles. */
  nx: number;
  ny: number;
  /** Height of the top surface at (x, y), 0 ≤ x ≤ width, 0 ≤ y ≤ depth. */
  top: (x: number, y: number) => number;
}

/** A block whose top is the surface z = top(x, y) on a regular grid: a height-field cavity. */
export function heightFieldBlock(spec: HeightFieldBlock): GeneratedMesh {
  const { width, depth, bottomZ, nx, ny, top } = spec;
  const w = new MeshWriter();
  const p = (i: number, j: number): number[] => {
    const x = (width * i) / nx,
      y = (depth * j) / ny;
    return [x, y, top(x, y)];
  };
  const b = (i: number, j: number): number[] => [(width * i) / nx, (depth * j) / ny, bottomZ];
  for (let j = 0; j < ny; j++) {
    for (let i = 0; i < nx; i++) w.quad(p(i, j), p(i + 1, j), p(i + 1, j + 1), p(i, j + 1));
  }
  // Walls along the four sides, then the bottom as a fan from its centre over the same edge points.
  const rim: [number, number][] = [];
  for (let i = 0; i < nx; i++) rim.push([i, 0]);
  for (let j = 0; j < ny; j++) rim.push([nx, j]);
  for (let i = nx; i > 0; i--) rim.push([i, ny]);
  for (let j = ny; j > 0; j--) rim.push([0, j]);
  const centre = [width / 2, depth / 2, bottomZ];
  for (let k = 0; k < rim.length; k++) {
    const [i0, j0] = rim[k]!,
      [i1, j1] = rim[(k + 1) % rim.length]!;
    w.quad(p(i0, j0), b(i0, j0), b(i1, j1), p(i1, j1));
    w.triangle(centre, b(i1, j1), b(i0, j0));
  }
  return w.done();
}

/**
 * A solid made of the cells of a rectilinear grid (xs, ys, zs are the grid lines) for which
 * solid(i, j, k) holds: blocks with rectangular pockets, steps, shafts and undercuts. Faces are
 * emitted between solid and empty cells only, so the surface is closed; avoid cells that touch
 * only along an edge (that edge would be shared by four triangles).
 */
export function cellSolid(xs: number[], ys: number[], zs: number[], solid: (i: number, j: number, k: number) => boolean): GeneratedMesh {
  const w = new MeshWriter();
  const nx = xs.length - 1,
    ny = ys.length - 1,
    nz = zs.length - 1;
  const filled = (i: number, j: number, k: number): boolean => i >= 0 && j >= 0 && k >= 0 && i < nx && j < ny && k < nz && solid(i, j, k);
  const grids = [xs, ys, zs];
  // For a face normal along axis a (sign s) at grid line g, spanning cell (u, v) of the other two
  // axes b = a + 1, c = a + 2 (cyclic): the quad (b0,c0) (b1,c0) (b1,c1) (b0,c1) faces +a.
  const point = (a: number, g: number, bIdx: number, cIdx: number): number[] => {
    const out = [0, 0, 0];
    out[a] = grids[a]![g]!;
    out[(a + 1) % 3] = grids[(a + 1) % 3]![bIdx]!;
    out[(a + 2) % 3] = grids[(a + 2) % 3]![cIdx]!;
    return out;
  };
  const dims = [nx, ny, nz];
  for (let a = 0; a < 3; a++) {
    const bAxis = (a + 1) % 3,
      cAxis = (a + 2) % 3;
    for (let g = 0; g <= dims[a]!; g++) {
      for (let u = 0; u < dims[bAxis]!; u++) {
        for (let v = 0; v < dims[cAxis]!; v++) {
          const cell = (along: number): boolean => {
            const idx = [0, 0, 0];
            idx[a] = along;
            idx[bAxis] = u;
            idx[cAxis] = v;
            return filled(idx[0]!, idx[1]!, idx[2]!);
          };
          const below = cell(g - 1),
            above = cell(g);
          if (below === above) continue;
          const q = [point(a, g, u, v), point(a, g, u + 1, v), point(a, g, u + 1, v + 1), point(a, g, u, v + 1)];
          if (below) w.quad(q[0]!, q[1]!, q[2]!, q[3]!);
          else w.quad(q[0]!, q[3]!, q[2]!, q[1]!);
        }
      }
    }
  }
  return w.done();
}

/** A torus about the z axis: major radius R, tube radius r, n × m quads with corners on the true surface. */
export function torus(R: number, r: number, n: number, m: number): GeneratedMesh {
  const w = new MeshWriter();
  const at = (i: number, j: number): number[] => {
    const phi = (2 * Math.PI * (i % n)) / n,
      theta = (2 * Math.PI * (j % m)) / m;
    const rho = R + r * Math.cos(theta);
    return [rho * Math.cos(phi), rho * Math.sin(phi), r * Math.sin(theta)];
  };
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < m; j++) w.quad(at(i, j), at(i + 1, j), at(i + 1, j + 1), at(i, j + 1));
  }
  return w.done();
}

/**
 * A 200 × 120 × 50 block with a closed T-slot pocket: a 60 mm wide channel from z 10 to 30 under
 * a 20 mm wide slot from z 30 up to the top, both 80 mm long. The channel's ceilings either side
 * of the slot are flat at z 30: air under them slides to the slot and out.
 */
export function tSlotBlock(): GeneratedMesh {
  return cellSolid(
    [0, 70, 90, 110, 130, 200],
    [0, 20, 100, 120],
    [0, 10, 30, 50],
    (i, j, k) => !((k === 1 && j === 1 && i >= 1 && i <= 3) || (k === 2 && j === 1 && i === 2)),
  );
}

/**
 * A 40 × 40 × 20 block with a shaft (x, y 15 → 25, from z 10 up) into a chamber (x, y 5 → 35,
 * z 5 → 10) whose ceiling has a recess (x, y 5 → 10, z 10 → 12) away from the shaft: resin fills
 * the chamber through the shaft and the recess holds its air (5 × 5 × 2 = 50 mm³, cuboid).
 */
export function recessedChamberBlock(): GeneratedMesh {
  const xs = [0, 5, 10, 15, 25, 35, 40];
  return cellSolid(
    xs,
    xs,
    [0, 5, 10, 12, 20],
    (i, j, k) => !((k === 1 && i >= 1 && i <= 4 && j >= 1 && j <= 4) || (k >= 2 && i === 3 && j === 3) || (k === 2 && i === 1 && j === 1)),
  );
}

/**
 * A 100 × 80 base plate (z 0 to 3) with a 80 × 60 board (z 10 to 15) standing on four 10 × 10
 * legs at its corners. With `recess`, the board's underside has a 60 × 40 pocket 2 mm deep
 * (z 10 to 12) cut up into it: a concave underside.
 */
export function boardOnLegs(recess: boolean): GeneratedMesh {
  return cellSolid([0, 10, 20, 80, 90, 100], [0, 10, 20, 60, 70, 80], [0, 3, 10, 12, 15], (i, j, k) => {
    const underBoard = i >= 1 && i <= 3 && j >= 1 && j <= 3;
    if (k === 0) return true;
    if (k === 1) return (i === 1 || i === 3) && (j === 1 || j === 3);
    if (k === 2) return underBoard && !(recess && i === 2 && j === 2);
    return underBoard;
  });
}

/** The held-air pocket of boardOnLegs(true): the recess itself. */
export function boardRecess(): GeneratedMesh {
  return cellSolid([20, 80], [20, 60], [10, 12], () => true);
}

/**
 * A bell: an inverted cup (outer radius 20, rim at z 10, top at z 35) whose inside is a cone
 * frustum, radius 15 at the rim narrowing to 12 at its ceiling (z 30), floating over a 60 × 60
 * plate (z 0 to 4) centred under it. Both are closed surfaces of `segments` sides.
 */
export function bellOverPlate(segments: number): GeneratedMesh {
  const cup = revolvedSolid(
    [
      [0, 30],
      [12, 30],
      [15, 10],
      [20, 10],
      [20, 35],
      [0, 35],
    ],
    segments,
  );
  return combined(
    cellSolid([-30, 30], [-30, 30], [0, 4], () => true),
    cup,
  );
}

/** The held-air pocket of bellOverPlate: the frustum inside the cup, from the rim (z 10) to its ceiling. */
export function bellInside(segments: number): GeneratedMesh {
  return revolvedSolid(
    [
      [0, 10],
      [15, 10],
      [12, 30],
      [0, 30],
    ],
    segments,
  );
}
