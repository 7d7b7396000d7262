import { knotLocator } from './level-knots';
import { triangleBelow, type TriangleBelow } from './triangle-fill';
import type { TriangleTable } from './triangle-table';
import { wetWithBox, wetWithOutline, type WettingClasses } from './wetting-classes';

/**
 * Quantities that are sums of per-triangle closed forms, as functions of the level h. With
 * F = (0, 0, z − h), whose divergence is 1, the free space below h inside a dam is, by the
 * divergence theorem, the dam's floor area × (h − zMin) plus Σ over the mould's faces of their
 * signed shadow × mean depth of h over them (the dam walls are vertical and the resin's top has
 * F = 0, so neither adds anything). Split so that nothing cancels for a mould standing on the table:
 *  up          Σ over faces that look up of shadow × depth(h): resin standing on them
 *  down        Σ over raised faces that look down of shadow × (h − zMin − depth(h)): the column
 *              from the table up to the face (or to h), counted once per face
 *  trapped     Σ over faces with air held against them of w × ∫ (min(z, h) − e)⁺ over the shadow,
 *              per unit shadow, with e the air's escape height and w = −(signed shadow): the air
 *              between the ceiling and the escape height, less what floors inside the pocket take
 *  sealed      the same with e = zMin, for hollows the pour never reaches
 *  wetted      mould surface touching resin with dams along the outline: Σ area × share(min(h, e))
 *  wettedBox   what the box dam adds: walls beside the table outside the mould's shadow
 * so that, with the dam's floor area A and the shadows' total W (= Σ over faces that look down),
 * resin(h) = up + down + (A − W)(h − zMin) − trapped − sealed. Each is a piecewise polynomial of
 * degree ≤ 3 whose pieces change only at corner heights and escape heights, stored as cubic
 * pieces between knots.
 */
export const enum LevelQuantity {
  Up = 0,
  Down = 1,
  Trapped = 2,
  Sealed = 3,
  Wetted = 4,
  WettedBox = 5,
}
export const levelQuantityCount = 6;

export interface LevelSeries {
  /** Ascending; knots[0] is the mould's lowest z, the last its highest z. */
  knots: Float64Array;
  /** Piece k of quantity q, valid for knots[k] < h ≤ knots[k + 1]: c0..c3 at (q * pieces + k) * 4, in t = h − knots[k]. */
  coefficients: Float64Array;
  /** Per quantity: value at the top knot and slope above it. */
  endValue: Float64Array;
  endSlope: Float64Array;
  /** True when the knots hold every corner height and escape height: each piece is then the exact polynomial. */
  complete: boolean;
  /** When not complete: a bound on the fill's interpolation error on each piece (mm³). */
  fillPieceErrorMm3: Float32Array | null;
}

/** Exact sums at a set of levels: values and slopes, from below (left) and from above (right). */
interface LevelSamples {
  valueLeft: Float64Array;
  slopeLeft: Float64Array;
  valueRight: Float64Array;
  slopeRight: Float64Array;
}

/** How one face takes part in the level quantities; one object is filled again face after face. */
export interface LevelFace {
  /** Its corner heights, lowest first. */
  z0: number;
  z1: number;
  z2: number;
  /** Where air held against it escapes: Infinity when nothing holds it, -Infinity in a hollow sealed from the pour. */
  escape: number;
  /** It looks up: resin stands on it. */
  up: boolean;
  /** A raised face that looks down: the column from the table up to it counts. */
  down: boolean;
  /** The wetted quantity it adds to (LevelQuantity.Wetted or WettedBox), or -1 when no resin can touch it. */
  wetQ: number;
}

export function readLevelFace(table: TriangleTable, classes: WettingClasses, escape: Float64Array | null, zMin: number, t: number, face: LevelFace): void {
  const facing = table.facing[t]!;
  const e = escape ? escape[t]! : Infinity;
  // A sealed hollow is never wetted.
  const wet = e === -Infinity ? 0 : classes.wet[t]!;
  face.z0 = table.sortedZ[3 * t]!;
  face.z1 = table.sortedZ[3 * t + 1]!;
  face.z2 = table.sortedZ[3 * t + 2]!;
  face.escape = e;
  face.up = facing > 0;
  face.down = facing < 0 && face.z2 > zMin;
  face.wetQ = wettedQuantity(wet);
}

/** The wetted quantity a face with these wetting bits adds to: with dams along the outline, only with the box dam, or none (-1). */
export function wettedQuantity(wet: number): number {
  return wet & wetWithOutline ? LevelQuantity.Wetted : wet & wetWithBox ? LevelQuantity.WettedBox : -1;
}

/** Knots per block of the run arrays; each block keeps its own origin so sums stay small. */
const blockSize = 32;
/** Ranges this short are evaluated point by point instead of as a run. */
const shortRange = 4;

/**
 * Evaluates every quantity at the ascending `points`, exactly. Between its corner heights a
 * triangle's contribution is one polynomial of degree ≤ 3 in h, so over the points inside each
 * such range it is added once, as a run in difference arrays of polynomial coefficients (in blocks
 * of points with their own origin, which keeps the sums free of cancellation); points that are a
 * corner height or a ceiling, where the limits from below and above differ, and very short ranges
 * are evaluated directly. The cost is O(triangles + points), however many points a tall wall spans.
 */
export function sampleLevels(
  points: Float64Array,
  table: TriangleTable,
  classes: WettingClasses,
  escape: Float64Array | null,
  zMin: number,
  cornerShadow: Float64Array | null = null,
): LevelSamples {
  const n = points.length;
  const size = levelQuantityCount * n;
  const samples: LevelSamples = {
    valueLeft: new Float64Array(size),
    slopeLeft: new Float64Array(size),
    valueRight: new Float64Array(size),
    slopeRight: new Float64Array(size),
  };
  const { valueLeft, slopeLeft, valueRight, slopeRight } = samples;
  // runs[(q * 4 + i) * (n + 1) + k]: coefficient i of quantity q, as differences over k.
  const runs = new Float64Array(levelQuantityCount * 4 * (n + 1));
  const below: TriangleBelow = { share: 0, shareSlope: 0, depth: 0 };
  // Per-range polynomials in w = h − z0: share (3 coefficients), depth (4), then per quantity (4).
  const share = new Float64Array(3),
    depth = new Float64Array(4),
    quantity = new Float64Array(4);

  // Unbounded ranges (above a triangle, below one) are linear in h: plain difference arrays.
  const linear = new Float64Array(levelQuantityCount * 2 * (n + 1));
  const addRun = (q: number, from: number, to: number, z0: number): void => {
    for (let lo = from; lo < to;) {
      const blockStart = lo - (lo % blockSize);
      const hi = Math.min(to, blockStart + blockSize);
      const d = points[blockStart]! - z0;
      const c0 = quantity[0]!,
        c1 = quantity[1]!,
        c2 = quantity[2]!,
        c3 = quantity[3]!;
      const e0 = c0 + d * (c1 + d * (c2 + d * c3)),
        e1 = c1 + d * (2 * c2 + 3 * c3 * d),
        e2 = c2 + 3 * c3 * d,
        e3 = c3;
      const base = q * 4 * (n + 1);
      runs[base + lo]! += e0;
      runs[base + hi]! -= e0;
      runs[base + (n + 1) + lo]! += e1;
      runs[base + (n + 1) + hi]! -= e1;
      runs[base + 2 * (n + 1) + lo]! += e2;
      runs[base + 2 * (n + 1) + hi]! -= e2;
      runs[base + 3 * (n + 1) + lo]! += e3;
      runs[base + 3 * (n + 1) + hi]! -= e3;
      lo = hi;
    }
  };

  // The triangle being added; one object reused so the helpers below are created once.
  // `down` only for raised faces: one lying on the table has no column under it.
  const tri = { z0: 0, z1: 0, z2: 0, shadowArea: 0, area: 0, up: false, down: false, wetQ: -1, wetEnd: 0 };
  const { atLeast, above } = knotLocator(points);
  // Each vertex's place among the points, found once: a vertex is shared by about six triangles.
  // Both indices only grow with z, so a triangle's lowest, middle and highest corner take the
  // smallest, middle and largest of its vertices' indices.
  const positions = table.positions,
    vertexCount = positions.length / 3;
  const vertexAtLeast = new Int32Array(vertexCount),
    vertexAbove = new Int32Array(vertexCount);
  for (let v = 0; v < vertexCount; v++) {
    const z = positions[3 * v + 2]!,
      a = atLeast(z);
    vertexAtLeast[v] = a;
    vertexAbove[v] = points[a] === z ? above(z, a) : a;
  }

  /** Point k, at one of the triangle's corner heights: the limit from below or from above. */
  const direct = (k: number, right: boolean, wetToo: boolean): void => {
    const h = points[k]!;
    triangleBelow(tri.z0, tri.z1, tri.z2, h, right, below);
    const value = right ? valueRight : valueLeft;
    const slope = right ? slopeRight : slopeLeft;
    if (tri.up) {
      const v = tri.shadowArea * below.depth,
        dv = tri.shadowArea * below.share;
      value[LevelQuantity.Up * n + k]! += v;
      slope[LevelQuantity.Up * n + k]! += dv;
    }
    if (tri.down) {
      const v = tri.shadowArea * (h - zMin - below.depth),
        dv = tri.shadowArea * (1 - below.share);
      value[LevelQuantity.Down * n + k]! += v;
      slope[LevelQuantity.Down * n + k]! += dv;
    }
    if (tri.wetQ >= 0 && wetToo) {
      const v = tri.area * below.share,
        dv = tri.area * below.shareSlope;
      value[tri.wetQ * n + k]! += v;
      slope[tri.wetQ * n + k]! += dv;
    }
  };

  /** Adds a + b·h over points [from, to) for quantity q. */
  const addLinear = (q: number, from: number, to: number, a: number, b: number): void => {
    if (to <= from) return;
    const base = q * 2 * (n + 1);
    linear[base + from]! += a;
    linear[base + to]! -= a;
    linear[base + (n + 1) + from]! += b;
    linear[base + (n + 1) + to]! -= b;
  };

  /**
   * Most ranges are a point or two (small triangles between knots), so this point-by-point path
   * carries most of the work. Strictly inside a range the limits from below and above agree and
   * the branch of triangleBelow is known, so it evaluates that branch's formulas directly, written
   * exactly as there (same operations in the same order; factors that do not depend on h are
   * computed once), and adds to both limits the sums `direct` would: bit-identical.
   */
  const insidePoints = (from: number, to: number, lowerBranch: boolean): void => {
    const z0 = tri.z0,
      z1 = tri.z1,
      z2 = tri.z2,
      shadowArea = tri.shadowArea,
      area = tri.area;
    const up = tri.up,
      down = tri.down,
      wetQ = tri.wetQ,
      wetEnd = tri.wetEnd;
    const span = z2 - z0,
      lower = (z1 - z0) * span,
      lower3 = 3 * lower;
    const upperSpan = z2 - z1,
      upper = upperSpan * span,
      upper3 = 3 * upper;
    const lowerDepth = ((z1 - z0) * (z1 - z0)) / (3 * span),
      upperSpan2 = upperSpan * upperSpan;
    for (let k = from; k < to; k++) {
      const h = points[k]!;
      let share: number, shareSlope: number, depth: number;
      if (lowerBranch) {
        const d = h - z0;
        share = (d * d) / lower;
        shareSlope = (2 * d) / lower;
        depth = (d * d * d) / lower3;
      } else {
        const e = z2 - h,
          passed = h - z1;
        share = 1 - (e * e) / upper;
        shareSlope = (2 * e) / upper;
        depth = lowerDepth + passed * (1 - (upperSpan2 + upperSpan * e + e * e) / upper3);
      }
      if (up) {
        const v = shadowArea * depth,
          dv = shadowArea * share,
          at = LevelQuantity.Up * n + k;
        valueLeft[at]! += v;
        slopeLeft[at]! += dv;
        valueRight[at]! += v;
        slopeRight[at]! += dv;
      }
      if (down) {
        const v = shadowArea * (h - zMin - depth),
          dv = shadowArea * (1 - share),
          at = LevelQuantity.Down * n + k;
        valueLeft[at]! += v;
        slopeLeft[at]! += dv;
        valueRight[at]! += v;
        slopeRight[at]! += dv;
      }
      if (wetQ >= 0 && k < wetEnd) {
        const v = area * share,
          dv = area * shareSlope,
          at = wetQ * n + k;
        valueLeft[at]! += v;
        slopeLeft[at]! += dv;
        valueRight[at]! += v;
        slopeRight[at]! += dv;
      }
    }
  };

  /**
   * One open range of points inside a branch, where the contribution is the polynomial in
   * share/depth that `setBranch` wrote (in w = h − z0): short ones point by point, long ones as runs.
   */
  const branch = (from: number, to: number, setBranch: () => void): void => {
    if (to <= from) return;
    if (to - from <= shortRange) {
      insidePoints(from, to, setBranch === setLower);
      return;
    }
    setBranch();
    if (tri.up) {
      for (let i = 0; i < 4; i++) quantity[i] = tri.shadowArea * depth[i]!;
      addRun(LevelQuantity.Up, from, to, tri.z0);
    }
    if (tri.down) {
      // (w + g) − depth, with g = z0 − zMin.
      const g = tri.z0 - zMin;
      quantity[0] = tri.shadowArea * (g - depth[0]!);
      quantity[1] = tri.shadowArea * (1 - depth[1]!);
      quantity[2] = -tri.shadowArea * depth[2]!;
      quantity[3] = -tri.shadowArea * depth[3]!;
      addRun(LevelQuantity.Down, from, to, tri.z0);
    }
    if (tri.wetQ >= 0) {
      quantity[0] = tri.area * share[0]!;
      quantity[1] = tri.area * share[1]!;
      quantity[2] = tri.area * share[2]!;
      quantity[3] = 0;
      addRun(tri.wetQ, from, Math.min(to, tri.wetEnd), tri.z0);
    }
  };
  const setLower = (): void => {
    const lower = (tri.z1 - tri.z0) * (tri.z2 - tri.z0);
    share[0] = 0;
    share[1] = 0;
    share[2] = 1 / lower;
    depth[0] = 0;
    depth[1] = 0;
    depth[2] = 0;
    depth[3] = 1 / (3 * lower);
  };
  const setUpper = (): void => {
    const span = tri.z2 - tri.z0,
      z10 = tri.z1 - tri.z0,
      z21 = tri.z2 - tri.z1,
      upper = z21 * span;
    share[0] = 1 - (span * span) / upper;
    share[1] = (2 * span) / upper;
    share[2] = -1 / upper;
    depth[0] = (z10 * z10) / (3 * span) - z10 - (z21 * z21 * z21 - span * span * span) / (3 * upper);
    depth[1] = 1 - (span * span) / upper;
    depth[2] = span / upper;
    depth[3] = -1 / (3 * upper);
  };

  const face: LevelFace = { z0: 0, z1: 0, z2: 0, escape: 0, up: false, down: false, wetQ: -1 };
  for (let t = 0; t < table.count; t++) {
    readLevelFace(table, classes, escape, zMin, t, face);
    const { z0, z1, z2, escape: e, up, down, wetQ } = face;
    if (!up && !down && wetQ < 0) continue;
    const shadowArea = Math.abs(table.shadowArea[t]!),
      area = table.area[t]!;
    // i·a: first point at or above the corner; i·b: first point above it.
    const va = table.triangles[3 * t]!,
      vb = table.triangles[3 * t + 1]!,
      vc = table.triangles[3 * t + 2]!;
    const aa = vertexAtLeast[va]!,
      ab = vertexAtLeast[vb]!,
      ac = vertexAtLeast[vc]!;
    const i0a = Math.min(aa, ab, ac),
      i2a = Math.max(aa, ab, ac),
      i1a = aa + ab + ac - i0a - i2a;
    const ba = vertexAbove[va]!,
      bb = vertexAbove[vb]!,
      bc = vertexAbove[vc]!;
    const i0b = Math.min(ba, bb, bc),
      i2b = Math.max(ba, bb, bc),
      i1b = ba + bb + bc - i0b - i2b;
    // Above its escape height the face is held dry by air: it stays wet only below that.
    const wetEnd = e === Infinity ? n : atLeast(e);
    tri.z0 = z0;
    tri.z1 = z1;
    tri.z2 = z2;
    tri.shadowArea = shadowArea;
    tri.area = area;
    tri.up = up;
    tri.down = down;
    tri.wetQ = wetQ;
    tri.wetEnd = wetEnd;

    if (cornerShadow && (up || down)) {
      // For the error bound: the pieces holding a corner strictly inside them.
      if (i0a > 0 && i0a < n && i0a === i0b) cornerShadow[i0a - 1]! += shadowArea;
      if (i1a > 0 && i1a < n && i1a === i1b && i1a !== i0a) cornerShadow[i1a - 1]! += shadowArea;
      if (i2a > 0 && i2a < n && i2a === i2b && i2a !== i1a) cornerShadow[i2a - 1]! += shadowArea;
    }
    // Below a raised face that looks down, the column from the table up to h.
    if (down) addLinear(LevelQuantity.Down, 0, i0a, -shadowArea * zMin, shadowArea);
    if (z1 > z0) branch(i0b, i1a, setLower);
    if (z2 > z1) branch(i1b, i2a, setUpper);
    // Above the triangle: fill grows with the whole shadow, the share is 1, the column under a raised face is fixed.
    const mean = (z0 + z1 + z2) / 3;
    if (up) addLinear(LevelQuantity.Up, i2b, n, -shadowArea * mean, shadowArea);
    if (down) addLinear(LevelQuantity.Down, i2b, n, shadowArea * (mean - zMin), 0);
    if (wetQ >= 0) addLinear(wetQ, i2b, wetEnd, area, 0);

    // Corner heights: both limits, directly.
    for (let k = i0a; k < i0b; k++) {
      direct(k, false, points[k]! <= e);
      direct(k, true, points[k]! < e);
    }
    if (z1 !== z0)
      for (let k = i1a; k < i1b; k++) {
        direct(k, false, points[k]! <= e);
        direct(k, true, points[k]! < e);
      }
    if (z2 !== z1)
      for (let k = i2a; k < i2b; k++) {
        direct(k, false, points[k]! <= e);
        direct(k, true, points[k]! < e);
      }
    if (wetQ >= 0 && e !== Infinity) {
      // At the escape height itself the face is still wet from below; above it, what was wet stays so.
      triangleBelow(z0, z1, z2, e, false, below);
      const frozen = area * below.share;
      let k = wetEnd;
      for (; k < n && points[k] === e; k++) {
        if (e !== z0 && e !== z1 && e !== z2) {
          valueLeft[wetQ * n + k]! += frozen;
          slopeLeft[wetQ * n + k]! += area * below.shareSlope;
        }
        valueRight[wetQ * n + k]! += frozen;
      }
      addLinear(wetQ, k, n, frozen, 0);
    }
  }
  if (escape) addHeldAir(points, table, escape, zMin, samples, linear, atLeast, above, cornerShadow);

  for (let q = 0; q < levelQuantityCount; q++) {
    const base = q * 4 * (n + 1),
      linearBase = q * 2 * (n + 1);
    let c0 = 0,
      c1 = 0,
      c2 = 0,
      c3 = 0,
      a = 0,
      b = 0;
    for (let k = 0; k < n; k++) {
      c0 += runs[base + k]!;
      c1 += runs[base + (n + 1) + k]!;
      c2 += runs[base + 2 * (n + 1) + k]!;
      c3 += runs[base + 3 * (n + 1) + k]!;
      a += linear[linearBase + k]!;
      b += linear[linearBase + (n + 1) + k]!;
      const sOff = points[k]! - points[k - (k % blockSize)]!;
      const v = c0 + sOff * (c1 + sOff * (c2 + sOff * c3)) + a + b * points[k]!;
      const dv = c1 + sOff * (2 * c2 + 3 * c3 * sOff) + b;
      valueLeft[q * n + k]! += v;
      slopeLeft[q * n + k]! += dv;
      valueRight[q * n + k]! += v;
      slopeRight[q * n + k]! += dv;
    }
  }
  return samples;
}

/**
 * The trapped and sealed quantities: for each face with air held against it, above its escape
 * height e (zMin for a sealed hollow), w·[(h − e) + depth(e) − depth(h)] = w·∫(min(z, h) − e)⁺ per
 * unit shadow, with w = −(signed shadow). Only faces of pockets take part, so they are evaluated
 * point by point between e and their top corner; above that the term is a constant.
 */
function addHeldAir(
  points: Float64Array,
  table: TriangleTable,
  escape: Float64Array,
  zMin: number,
  samples: LevelSamples,
  linear: Float64Array,
  atLeast: (z: number) => number,
  above: (z: number, from: number) => number,
  cornerShadow: Float64Array | null,
): void {
  const n = points.length;
  const { valueLeft, slopeLeft, valueRight, slopeRight } = samples;
  const at: TriangleBelow = { share: 0, shareSlope: 0, depth: 0 };
  for (let t = 0; t < table.count; t++) {
    const e = escape[t]!;
    if (e === Infinity || table.facing[t] === 0) continue;
    const q = e === -Infinity ? LevelQuantity.Sealed : LevelQuantity.Trapped;
    const s = e === -Infinity ? zMin : e;
    const w = -table.shadowArea[t]!;
    const z0 = table.sortedZ[3 * t]!,
      z1 = table.sortedZ[3 * t + 1]!,
      z2 = table.sortedZ[3 * t + 2]!;
    triangleBelow(z0, z1, z2, s, false, at);
    const depthAtS = at.depth;
    const from = atLeast(s),
      top = above(z2, atLeast(z2));
    for (let k = from; k < Math.min(top, n); k++) {
      const h = points[k]!;
      for (const right of [false, true]) {
        if (h === s && !right) continue;
        triangleBelow(z0, z1, z2, h, right, at);
        const value = right ? valueRight : valueLeft,
          slope = right ? slopeRight : slopeLeft;
        value[q * n + k]! += w * (h - s + depthAtS - at.depth);
        slope[q * n + k]! += w * (1 - at.share);
      }
    }
    const mean = (z0 + z1 + z2) / 3;
    if (top < n) {
      const base = q * 2 * (n + 1),
        constant = w * (mean - s + depthAtS);
      linear[base + top]! += constant;
      linear[base + n]! -= constant;
    }
    if (cornerShadow) {
      // The slope jumps at e and bends between the corners: at most 2|w| of slope change in all.
      for (const z of [s, z0, z1, z2]) {
        const k = atLeast(z);
        if (z >= s && k > 0 && k < n && points[k] !== z) cornerShadow[k - 1]! += 2 * Math.abs(w);
      }
    }
  }
}

/** Cubic Hermite pieces through exact values and one-sided slopes: exact wherever the function is one cubic. */
export function hermitePieces(knots: Float64Array, samples: LevelSamples): Float64Array {
  const n = knots.length,
    pieces = n - 1;
  const coefficients = new Float64Array(levelQuantityCount * pieces * 4);
  for (let q = 0; q < levelQuantityCount; q++) {
    for (let k = 0; k < pieces; k++) {
      const width = knots[k + 1]! - knots[k]!;
      const y0 = samples.valueRight[q * n + k]!,
        m0 = samples.slopeRight[q * n + k]!;
      const y1 = samples.valueLeft[q * n + k + 1]!,
        m1 = samples.slopeLeft[q * n + k + 1]!;
      const secant = (y1 - y0) / width;
      const at = (q * pieces + k) * 4;
      coefficients[at] = y0;
      coefficients[at + 1] = m0;
      coefficients[at + 2] = (3 * secant - 2 * m0 - m1) / width;
      coefficients[at + 3] = (m0 + m1 - 2 * secant) / (width * width);
    }
  }
  return coefficients;
}

/** The value of quantity q at level h (the limit from below at a knot). */
export function seriesValue(series: LevelSeries, q: LevelQuantity, h: number): number {
  const knots = series.knots;
  const last = knots.length - 1;
  if (!(h > knots[0]!)) return 0;
  if (h > knots[last]!) return series.endValue[q]! + series.endSlope[q]! * (h - knots[last]!);
  let lo = 0,
    hi = last;
  while (hi - lo > 1) {
    const mid = (lo + hi) >>> 1;
    if (knots[mid]! < h) lo = mid;
    else hi = mid;
  }
  const t = h - knots[lo]!;
  const at = (q * last + lo) * 4;
  const c = series.coefficients;
  return c[at]! + t * (c[at + 1]! + t * (c[at + 2]! + t * c[at + 3]!));
}

/** Bound on the fill's interpolation error (mm³) at h, from the piece holding it; 0 when the series is exact there (complete, or h a knot). */
export function seriesFillErrorMm3(series: LevelSeries, h: number): number {
  const errors = series.fillPieceErrorMm3;
  if (!errors) return 0;
  const knots = series.knots;
  const last = knots.length - 1;
  if (!(h > knots[0]!) || h > knots[last]!) return 0;
  let lo = 0,
    hi = last;
  while (hi - lo > 1) {
    const mid = (lo + hi) >>> 1;
    if (knots[mid]! < h) lo = mid;
    else hi = mid;
  }
  // At a knot the piece takes the value summed there: only rounding is left.
  return h === knots[hi] ? 0 : errors[lo]!;
}

/**
 * Bound on the interpolation error of the fill on each piece, when the knots are not complete.
 * The Hermite cubic reproduces every cubic, so on a piece only triangles with a corner strictly
 * inside it contribute error, each through g = shadow · depth(h), whose second derivative
 * shadow · share'(h) is never negative and integrates to at most shadow over the piece. By the
 * Peano kernel theorem (the interpolation reproduces linear functions), |error| ≤ sup|K| · ∫ g''
 * with K the kernel of the hinge (t − s)₊; for cubic Hermite on a piece of width Δ, sup|K| = 4Δ/27
 * (approached by a hinge just inside the piece, at a third of the way along).
 */
function fillPieceBounds(knots: Float64Array, cornerShadow: Float64Array): Float32Array {
  const bounds = new Float32Array(knots.length - 1);
  for (let k = 0; k + 1 < knots.length; k++) bounds[k] = (4 / 27) * (knots[k + 1]! - knots[k]!) * cornerShadow[k]! * (1 + 1e-6);
  return bounds;
}

/** Builds the series on the given knots, with the fill's error bound per piece when they are not complete. */
export function buildLevelSeries(
  knots: Float64Array,
  complete: boolean,
  table: TriangleTable,
  classes: WettingClasses,
  escape: Float64Array | null,
  zMin: number,
): LevelSeries {
  const n = knots.length;
  const cornerShadow = complete ? null : new Float64Array(n - 1);
  const samples = sampleLevels(knots, table, classes, escape, zMin, cornerShadow);
  const coefficients = hermitePieces(knots, samples);
  const endValue = new Float64Array(levelQuantityCount);
  const endSlope = new Float64Array(levelQuantityCount);
  for (let q = 0; q < levelQuantityCount; q++) {
    endValue[q] = samples.valueRight[q * n + n - 1]!;
    endSlope[q] = samples.slopeRight[q * n + n - 1]!;
  }
  return { knots, coefficients, endValue, endSlope, complete, fillPieceErrorMm3: cornerShadow ? fillPieceBounds(knots, cornerShadow) : null };
}
