import { writeFileSync } from 'node:fs';
import { encodeStlBinary } from '@gelpoint/mesh';
import { heightFieldBlock } from '../../packages/mesh/test/moulds';

/** The fill level the CLI is asked for: the same one the cavity-engine bench measures at. */
export const BENCH_LEVEL_MM = 38;

/**
 * The cavity-engine bench's 1M-triangle mould (packages/mesh/bench: a 300 × 200 mm terrain block on a
 * 707 × 707 grid), written as a binary STL of about 50 MB.
 */
export function writeBenchMould(path: string): number {
  const n = 707;
  const bytes = encodeStlBinary(
    heightFieldBlock({
      width: 300,
      depth: 200,
      bottomZ: 0,
      nx: n,
      ny: n,
      top: (x, y) => 40 - 12 * Math.sin((Math.PI * x) / 300) * Math.sin((Math.PI * y) / 200) - 3 * Math.cos(x / 7) * Math.sin(y / 5),
    }),
    'solid bench mould',
  );
  writeFileSync(path, bytes);
  return bytes.length;
}
