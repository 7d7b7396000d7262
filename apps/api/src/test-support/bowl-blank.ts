import { encodeStlBinary } from '@gelpoint/mesh';
import { revolvedPocketBlock } from '../../../../packages/mesh/test/moulds';

export interface BowlBlank {
  /** Half the side of the square blank (mm). */
  halfSide: number;
  /** Height of the blank; the bowl is turned into its top face. */
  topMm: number;
  /** Radius of the hemispherical bowl; its bottom stands at topMm − radiusMm above the underside. */
  radiusMm: number;
}

/** Polar angles of the bowl's rings: `rings` evenly spaced, plus one exactly at each of the given depths. */
function ringAngles(radiusMm: number, depthsMm: readonly number[], rings = 96): number[] {
  const even = Array.from({ length: rings + 1 }, (_, k) => (Math.PI / 2) * (k / rings));
  const exact = depthsMm.map((d) => Math.acos((radiusMm - d) / radiusMm));
  return [...new Set([...even, ...exact])].sort((a, b) => a - b);
}

/**
 * A square blank with a hemispherical bowl turned into its top, as a closed binary STL, with a ring at each given
 * depth above the bowl's bottom so the resin surface there meets the mesh along a ring.
 */
export function bowlBlankStl(b: BowlBlank, exactDepthsMm: readonly number[] = []): Buffer {
  const profile = ringAngles(b.radiusMm, exactDepthsMm).map((t) => [b.radiusMm * Math.sin(t), b.topMm - b.radiusMm * Math.cos(t)] as [number, number]);
  return Buffer.from(encodeStlBinary(revolvedPocketBlock({ halfSide: b.halfSide, bottomZ: 0, topZ: b.topMm, profile, segments: 256 })));
}

/** CRC Concise Encyclopedia of Mathematics, spherical cap of height h on a sphere of radius r: V = πh²(3r − h)/3. */
export const sphericalCapMm3 = (radiusMm: number, heightMm: number) => (Math.PI * heightMm * heightMm * (3 * radiusMm - heightMm)) / 3;
