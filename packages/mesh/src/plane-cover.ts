/**
 * Which point of the plane belongs to which triangle's shadow, decided the same way everywhere so
 * that a vertical ray through a shared edge or corner meets exactly one of the triangles there.
 *
 * Each edge is evaluated with its end points in a fixed (lexicographic) order, so two triangles
 * sharing an edge compute the very same floating-point value. A point exactly on an edge belongs to
 * the triangle lying on the edge's positive side; that equals nudging the point by (−ε², +ε) and is
 * therefore consistent at corners too.
 */
export function edgeValue(ax: number, ay: number, bx: number, by: number, px: number, py: number): number {
  if (ax > bx || (ax === bx && ay > by)) {
    return (ax - bx) * (py - by) - (ay - by) * (px - bx);
  }
  return (bx - ax) * (py - ay) - (by - ay) * (px - ax);
}

/** 1 when (px, py) lies in the shadow of the triangle (x0, y0)-(x1, y1)-(x2, y2) by the rule above. */
export function shadowContains(x0: number, y0: number, x1: number, y1: number, x2: number, y2: number, px: number, py: number): boolean {
  const s0 = edgeValue(x1, y1, x2, y2, x0, y0);
  const s1 = edgeValue(x2, y2, x0, y0, x1, y1);
  const s2 = edgeValue(x0, y0, x1, y1, x2, y2);
  if (s0 === 0 || s1 === 0 || s2 === 0) return false;
  const e0 = edgeValue(x1, y1, x2, y2, px, py);
  if (e0 === 0 ? s0 < 0 : e0 > 0 !== s0 > 0) return false;
  const e1 = edgeValue(x2, y2, x0, y0, px, py);
  if (e1 === 0 ? s1 < 0 : e1 > 0 !== s1 > 0) return false;
  const e2 = edgeValue(x0, y0, x1, y1, px, py);
  if (e2 === 0 ? s2 < 0 : e2 > 0 !== s2 > 0) return false;
  return true;
}

/**
 * The x-range [lo, hi] of the triangle's shadow within the horizontal band ylo ≤ y ≤ yhi
 * (a single line when ylo = yhi), written to out[0], out[1]; false when the band misses it.
 */
export function shadowSpanInBand(x0: number, y0: number, x1: number, y1: number, x2: number, y2: number, ylo: number, yhi: number, out: Float64Array): boolean {
  let lo = Infinity,
    hi = -Infinity;
  if (y0 >= ylo && y0 <= yhi) {
    if (x0 < lo) lo = x0;
    if (x0 > hi) hi = x0;
  }
  if (y1 >= ylo && y1 <= yhi) {
    if (x1 < lo) lo = x1;
    if (x1 > hi) hi = x1;
  }
  if (y2 >= ylo && y2 <= yhi) {
    if (x2 < lo) lo = x2;
    if (x2 > hi) hi = x2;
  }
  // Where each edge crosses the band's two boundary lines (the second only for a real band).
  for (let pass = 0; pass < (yhi === ylo ? 1 : 2); pass++) {
    const y = pass === 0 ? ylo : yhi;
    if ((y0 < y && y1 > y) || (y0 > y && y1 < y)) {
      const x = x0 + ((y - y0) / (y1 - y0)) * (x1 - x0);
      if (x < lo) lo = x;
      if (x > hi) hi = x;
    }
    if ((y1 < y && y2 > y) || (y1 > y && y2 < y)) {
      const x = x1 + ((y - y1) / (y2 - y1)) * (x2 - x1);
      if (x < lo) lo = x;
      if (x > hi) hi = x;
    }
    if ((y2 < y && y0 > y) || (y2 > y && y0 < y)) {
      const x = x2 + ((y - y2) / (y0 - y2)) * (x0 - x2);
      if (x < lo) lo = x;
      if (x > hi) hi = x;
    }
  }
  if (lo > hi) return false;
  out[0] = lo;
  out[1] = hi;
  return true;
}
