import type { EdgeTopology } from './edge-topology';

export interface WindingRepair {
  /** Triangles whose winding was turned to agree with their neighbours. */
  turned: number;
  /** Edges where no consistent winding exists (a one-sided surface such as a Möbius band). */
  conflicts: number;
}

function turnTriangle(triangles: Uint32Array, t: number): void {
  const b = triangles[3 * t + 1]!;
  triangles[3 * t + 1] = triangles[3 * t + 2]!;
  triangles[3 * t + 2] = b;
}

/**
 * Makes the winding agree across every two-triangle edge by a breadth-first walk over each
 * connected patch. Within a patch the orientation held by more triangles wins, so a file with a
 * few backwards triangles loses only those. Works in place.
 */
export function repairWinding(triangles: Uint32Array, topology: EdgeTopology): WindingRepair {
  const count = triangles.length / 3;
  // 0: not reached yet; 1: keep as written; 2: turn.
  const state = new Uint8Array(count);
  const queue = new Uint32Array(count);
  const patch = new Uint32Array(count);
  let conflicts = 0;
  let turned = 0;
  for (let seed = 0; seed < count; seed++) {
    if (state[seed]) continue;
    state[seed] = 1;
    let head = 0,
      tail = 0,
      patchSize = 0,
      turnCount = 0;
    queue[tail++] = seed;
    while (head < tail) {
      const t = queue[head++]!;
      patch[patchSize++] = t;
      if (state[t] === 2) turnCount++;
      for (let k = 0; k < 3; k++) {
        const e = 3 * t + k;
        const other = topology.neighbour[e]!;
        if (other < 0) continue;
        // Across an edge both run the same way: the neighbour needs the opposite choice to ours.
        const wanted = topology.sameDirection[e] ? 3 - state[t]! : state[t]!;
        if (!state[other]) {
          state[other] = wanted;
          queue[tail++] = other;
        } else if (state[other] !== wanted) {
          conflicts++;
        }
      }
    }
    const flipPatch = turnCount * 2 > patchSize;
    for (let i = 0; i < patchSize; i++) {
      const t = patch[i]!;
      if ((state[t] === 2) !== flipPatch) {
        turnTriangle(triangles, t);
        turned++;
      }
    }
  }
  // Each conflicting edge is met from both sides.
  return { turned, conflicts: Math.ceil(conflicts / 2) };
}

export function turnAllTriangles(triangles: Uint32Array): void {
  for (let t = 0; t < triangles.length / 3; t++) turnTriangle(triangles, t);
}
