import alea from 'alea';
import { createNoise2D } from 'simplex-noise';
import { encodeStlBinary } from '@gelpoint/mesh';

/**
 * The demo shop's mould, made here rather than shipped: a round bowl blank with an uneven, lagoon-like pocket
 * machined into its top. Invented demo data; every number below is a design choice, not a measurement.
 */
export interface DemoMouldSpec {
  blankDiameterMm: number;
  blankThicknessMm: number;
  /** Mean radius of the pocket's shore; the shore wanders by `shoreWobbleMm` either way. */
  pocketRadiusMm: number;
  shoreWobbleMm: number;
  /** Depth of the pocket below the blank's top face, shallowest and deepest. */
  minDepthMm: number;
  maxDepthMm: number;
  /** Vertices around each ring, and rings across the pocket floor (centre to shore). */
  segments: number;
  floorRings: number;
  /** Size of the biggest hills and hollows in the floor. */
  featureMm: number;
  /** The noise's seed: the same seed always gives the same mould, to the bit. */
  seed: string;
}

export const demoMouldSpec: DemoMouldSpec = {
  blankDiameterMm: 300,
  blankThicknessMm: 60,
  pocketRadiusMm: 115,
  shoreWobbleMm: 12,
  minDepthMm: 10,
  maxDepthMm: 40,
  segments: 256,
  floorRings: 56,
  featureMm: 110,
  seed: 'kettle-creek-lagoon',
};

export interface DemoMouldMesh {
  /** Nine coordinates per triangle, wound counter-clockwise seen from outside the blank. */
  positions: Float64Array;
  triangleCount: number;
}

type Point = [number, number, number];

/**
 * The blank as a closed surface: one fan at the pocket's deepest centre, rings outward across the floor to the
 * shore, up the pocket wall, across the top face to the blank's edge, down its side, and a fan under the bottom.
 * Every ring has the same angles, so neighbouring rings share their vertices exactly and the mesh is watertight.
 */
export function demoMouldMesh(spec: DemoMouldSpec = demoMouldSpec): DemoMouldMesh {
  const random = alea(spec.seed);
  // Two independent fields from one seed: the floor's relief and the shore's wander.
  const relief = createNoise2D(random);
  const shore = createNoise2D(random);
  const n = spec.segments;
  const top = spec.blankThicknessMm;
  const blankRadius = spec.blankDiameterMm / 2;
  const angles = Array.from({ length: n }, (_, j) => (2 * Math.PI * j) / n);
  // Sampled on a circle of the noise plane, so the shore closes on itself without a seam.
  const shoreRadius = angles.map((phi) => spec.pocketRadiusMm + spec.shoreWobbleMm * shore(1.2 * Math.cos(phi), 1.2 * Math.sin(phi)));

  const heightAt = (x: number, y: number, fromCentre: number): number => {
    let sum = 0;
    for (let octave = 0, scale = 1 / spec.featureMm, weight = 1; octave < 3; octave++, scale *= 2, weight /= 2) {
      sum += weight * relief(x * scale, y * scale);
    }
    // Deeper towards the middle on the whole, as a lagoon is, with the relief on top.
    return sum + 0.8 * (1 - fromCentre * fromCentre);
  };
  const floor: { x: number; y: number; raw: number }[][] = [];
  const centreRaw = heightAt(0, 0, 0);
  let lowRaw = centreRaw,
    highRaw = centreRaw;
  for (let k = 1; k <= spec.floorRings; k++) {
    const fraction = k / spec.floorRings;
    floor.push(
      angles.map((phi, j) => {
        const r = shoreRadius[j]! * fraction;
        const x = r * Math.cos(phi),
          y = r * Math.sin(phi);
        const raw = heightAt(x, y, fraction);
        lowRaw = Math.min(lowRaw, raw);
        highRaw = Math.max(highRaw, raw);
        return { x, y, raw };
      }),
    );
  }
  // Stretched so the floor's vertices span exactly the chosen depths.
  const depthOf = (raw: number) => spec.minDepthMm + ((spec.maxDepthMm - spec.minDepthMm) * (raw - lowRaw)) / (highRaw - lowRaw);
  const rings: Point[][] = floor.map((ring) => ring.map((v) => [v.x, v.y, top - depthOf(v.raw)] as Point));
  rings.push(angles.map((phi, j) => [shoreRadius[j]! * Math.cos(phi), shoreRadius[j]! * Math.sin(phi), top]));
  rings.push(angles.map((phi) => [blankRadius * Math.cos(phi), blankRadius * Math.sin(phi), top]));
  rings.push(angles.map((phi) => [blankRadius * Math.cos(phi), blankRadius * Math.sin(phi), 0]));
  const firstPole: Point = [0, 0, top - depthOf(centreRaw)];
  const lastPole: Point = [0, 0, 0];

  const triangleCount = 2 * n * rings.length;
  const positions = new Float64Array(9 * triangleCount);
  let at = 0;
  const triangle = (a: Point, b: Point, c: Point) => {
    positions.set(a, at);
    positions.set(b, at + 3);
    positions.set(c, at + 6);
    at += 9;
  };
  for (let j = 0; j < n; j++) {
    const next = (j + 1) % n;
    triangle(firstPole, rings[0]![j]!, rings[0]![next]!);
    for (let k = 0; k + 1 < rings.length; k++) {
      const [a, b, c, d] = [rings[k]![j]!, rings[k + 1]![j]!, rings[k + 1]![next]!, rings[k]![next]!];
      triangle(a, b, c);
      triangle(a, c, d);
    }
    triangle(rings[rings.length - 1]![j]!, lastPole, rings[rings.length - 1]![next]!);
  }
  return { positions, triangleCount };
}

/** The mould as its maker's CAD program would export it: a binary STL in millimetres, z up. */
export function demoMouldStl(spec: DemoMouldSpec = demoMouldSpec): Uint8Array {
  return encodeStlBinary(demoMouldMesh(spec), 'Gelpoint demo mould: lagoon bowl blank, mm, z up');
}
