/** One step of a mould's peak table: columns with resin up to `upToMm` deep (and deeper than the step before) peak at `peakC`. */
export interface PeakBand {
  upToMm: number;
  peakC: number;
}

function round(x: number, digits: number): number {
  const f = 10 ** digits;
  return Math.round(x * f) / f;
}

/** Depths to millimetre thousandths: finer than any depth map, coarse enough to keep the table short. */
const bandDigits = 3;

/**
 * The step table of a mould's peak map: columns sorted by depth, runs of equal peak merged, each band
 * ending half-way to the next band's shallowest column so a client's float depths fall on the right side.
 */
export function peakBandsOf(depthsMm: Float32Array, peakMap: Float32Array): PeakBand[] {
  // Columns in order of depth, by a native sort of one number per column: a positive float32's bits rise with its
  // value, so (bits × 2^17 + column) sorts by depth and stays exact in a double for maps of up to 131,072 columns.
  const bits = new Uint32Array(depthsMm.buffer, depthsMm.byteOffset, depthsMm.length);
  const columnBits = 17;
  const sortable = depthsMm.length <= 2 ** columnBits;
  const keys = new Float64Array(depthsMm.length);
  let wet = 0;
  for (let k = 0; k < depthsMm.length; k++) if (depthsMm[k]! > 0 && Number.isFinite(peakMap[k]!)) keys[wet++] = sortable ? bits[k]! * 2 ** columnBits + k : k;
  const order = keys.subarray(0, wet);
  order.sort(sortable ? undefined : (a, b) => depthsMm[a]! - depthsMm[b]!);
  const bands: { upToMm: number; peakC: number }[] = [];
  let lastDepth = 0;
  for (const key of order) {
    const k = sortable ? key % 2 ** columnBits : key;
    const peakC = round(peakMap[k]!, 2);
    const d = depthsMm[k]!;
    const open = bands.at(-1);
    if (open && open.peakC === peakC) {
      lastDepth = d;
      continue;
    }
    if (open) open.upToMm = round((lastDepth + d) / 2, bandDigits);
    bands.push({ upToMm: d, peakC });
    lastDepth = d;
  }
  const closing = bands.at(-1);
  if (closing) closing.upToMm = round(lastDepth, bandDigits) + 10 ** -bandDigits;
  return bands;
}

/** The painted peak of a column of this resin depth; null where no resin stands or beyond the table. */
export function peakAtDepth(bands: PeakBand[], depthMm: number): number | null {
  if (!(depthMm > 0) || bands.length === 0) return null;
  let lo = 0;
  let hi = bands.length - 1;
  if (depthMm > bands[hi]!.upToMm) return null;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (bands[mid]!.upToMm >= depthMm) hi = mid;
    else lo = mid + 1;
  }
  return bands[lo]!.peakC;
}
