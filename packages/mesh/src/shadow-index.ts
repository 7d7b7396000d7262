import { shadowSpanInBand } from './plane-cover';

/**
 * A uniform grid over the table listing, per cell, the triangles whose shadow touches it, so that
 * a single vertical ray or a shadow-overlap query looks at a handful of triangles, not all of them.
 * Triangles are entered row by row along their actual shadow, not their bounding box, so the long
 * thin fan triangles CAD programs put on flat faces stay cheap.
 */
export interface ShadowIndex {
  originX: number;
  originY: number;
  cellX: number;
  cellY: number;
  nx: number;
  ny: number;
  /** Items of cell c are items[start[c] .. start[c + 1]). */
  start: Uint32Array;
  items: Uint32Array;
}

export interface PlaneRect {
  minX: number;
  minY: number;
  maxX: number;
  maxY: number;
}

export function buildShadowIndex(positions: Float64Array, triangles: Uint32Array, include: Uint8Array, rect: PlaneRect): ShadowIndex {
  const count = triangles.length / 3;
  let included = 0;
  for (let t = 0; t < count; t++) if (include[t]) included++;
  const width = Math.max(rect.maxX - rect.minX, 1e-9),
    depth = Math.max(rect.maxY - rect.minY, 1e-9);
  const cells = Math.min(1 << 20, Math.max(1, Math.ceil(included / 2)));
  const nx = Math.max(1, Math.min(4096, Math.round(Math.sqrt((cells * width) / depth))));
  const ny = Math.max(1, Math.min(4096, Math.round(cells / nx)));
  const cellX = width / nx,
    cellY = depth / ny;
  const originX = rect.minX,
    originY = rect.minY;
  const start = new Uint32Array(nx * ny + 1);
  const span = new Float64Array(2);
  let items = new Uint32Array(0);
  const fill = new Uint32Array(nx * ny);
  // Pass 0 counts the entries per cell, pass 1 writes them.
  for (let pass = 0; pass < 2; pass++) {
    for (let t = 0; t < count; t++) {
      if (!include[t]) continue;
      const a = 3 * triangles[3 * t]!,
        b = 3 * triangles[3 * t + 1]!,
        c = 3 * triangles[3 * t + 2]!;
      const x0 = positions[a]!,
        y0 = positions[a + 1]!,
        x1 = positions[b]!,
        y1 = positions[b + 1]!,
        x2 = positions[c]!,
        y2 = positions[c + 1]!;
      const slackX = cellX * 1e-9,
        slackY = cellY * 1e-9;
      const iMin = Math.max(0, Math.floor((Math.min(x0, x1, x2) - slackX - originX) / cellX));
      const iMax = Math.min(nx - 1, Math.floor((Math.max(x0, x1, x2) + slackX - originX) / cellX));
      const jMin = Math.max(0, Math.floor((Math.min(y0, y1, y2) - slackY - originY) / cellY));
      const jMax = Math.min(ny - 1, Math.floor((Math.max(y0, y1, y2) + slackY - originY) / cellY));
      const small = (iMax - iMin) * (jMax - jMin) <= 4;
      for (let j = jMin; j <= jMax; j++) {
        let iLo = iMin,
          iHi = iMax;
        if (!small) {
          // Large triangles: only the cells along their actual shadow, row by row.
          const ylo = originY + j * cellY - slackY,
            yhi = originY + (j + 1) * cellY + slackY;
          if (!shadowSpanInBand(x0, y0, x1, y1, x2, y2, ylo, yhi, span)) continue;
          iLo = Math.max(iMin, Math.floor((span[0]! - slackX - originX) / cellX));
          iHi = Math.min(iMax, Math.floor((span[1]! + slackX - originX) / cellX));
        }
        for (let i = iLo; i <= iHi; i++) {
          if (pass === 0) start[j * nx + i + 1]!++;
          else items[fill[j * nx + i]!++] = t;
        }
      }
    }
    if (pass === 0) {
      for (let c = 0; c < nx * ny; c++) start[c + 1]! += start[c]!;
      fill.set(start.subarray(0, nx * ny));
      items = new Uint32Array(start[nx * ny]!);
    }
  }
  return { originX, originY, cellX, cellY, nx, ny, start, items };
}
