/**
 * How much of one planar triangle lies below a level h, in closed form. With corner heights
 * z0 ≤ z1 ≤ z2, the share of the triangle (by area, the same for its shadow) lying below h is
 *   F(h) = (h − z0)² / ((z1 − z0)(z2 − z0))          for z0 ≤ h ≤ z1
 *   F(h) = 1 − (z2 − h)² / ((z2 − z1)(z2 − z0))      for z1 ≤ h ≤ z2
 * (the part below h is a triangle similar to a corner triangle, so its share grows with the square
 * of the distance), and G(h) = ∫ F dt from −∞ to h is the depth integral:
 * ∫ over the shadow of (h − z)⁺ dA = shadowArea × G(h). Above z2, G(h) = h − (z0 + z1 + z2)/3.
 * `right` chooses the limit from above at a level that equals a corner height, where a flat
 * triangle's share jumps from 0 to 1.
 */
export interface TriangleBelow {
  /** Share of the triangle below h. */
  share: number;
  /** d(share)/dh. */
  shareSlope: number;
  /** ∫ share dh: mean depth of resin over the triangle's shadow when filled to h. */
  depth: number;
}

export function triangleBelow(z0: number, z1: number, z2: number, h: number, right: boolean, out: TriangleBelow): void {
  if (h < z0 || (h === z0 && !right)) {
    out.share = 0;
    out.shareSlope = 0;
    out.depth = 0;
    return;
  }
  if (h > z2 || (h === z2 && right)) {
    out.share = 1;
    out.shareSlope = 0;
    out.depth = h - (z0 + z1 + z2) / 3;
    return;
  }
  const span = z2 - z0;
  if (z1 > z0 && (h < z1 || (h === z1 && !right))) {
    const d = h - z0,
      lower = (z1 - z0) * span;
    out.share = (d * d) / lower;
    out.shareSlope = (2 * d) / lower;
    out.depth = (d * d * d) / (3 * lower);
    return;
  }
  const upperSpan = z2 - z1,
    e = z2 - h,
    upper = upperSpan * span,
    passed = h - z1;
  out.share = 1 - (e * e) / upper;
  out.shareSlope = (2 * e) / upper;
  // (z2 − z1)³ − e³ factored as (h − z1)((z2 − z1)² + (z2 − z1)e + e²): no cancellation near z1.
  out.depth = ((z1 - z0) * (z1 - z0)) / (3 * span) + passed * (1 - (upperSpan * upperSpan + upperSpan * e + e * e) / (3 * upper));
}
