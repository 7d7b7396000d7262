import type { UpAxis } from '../types';

/** A 3 × 3 matrix, row by row: p' = M · p. */
export type Turn3 = readonly [number, number, number, number, number, number, number, number, number];

// The same proper rotations the cavity engine applies (packages/mesh frame.ts), so the mould on
// screen stands exactly as the report measured it:
//   up = z: (x, y, z) → (x, y, z)
//   up = y: (x, y, z) → (x, −z, y)
//   up = x: (x, y, z) → (y, z, x)
const turns: Record<UpAxis, Turn3> = {
  z: [1, 0, 0, 0, 1, 0, 0, 0, 1],
  y: [1, 0, 0, 0, 0, -1, 0, 1, 0],
  x: [0, 1, 0, 0, 0, 1, 1, 0, 0],
};

export function upAxisTurn(up: UpAxis): Turn3 {
  return turns[up];
}
