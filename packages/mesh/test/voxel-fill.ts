/**
 * An independent reckoning of the fill for moulds made of grid cells (cellSolid), by brute force
 * over the cells rather than over the mesh: the escape height of each free cell is the best, over
 * chains of free cells (touching by a face, an edge or a corner) leading out of the grid (its top
 * layer or its sides, where the dams stand clear), of the lowest cell top along the chain; air in
 * a cell stays between that height and the cell's top. A free region that never gets out but
 * rests on the table holds its air from the table up; one that does not is a sealed hollow.
 */
export interface VoxelFill {
  resinMm3: number;
  trappedAirMm3: number;
  sealedMm3: number;
}

export function voxelFill(
  xs: number[],
  ys: number[],
  zs: number[],
  solid: (i: number, j: number, k: number) => boolean,
  levelMm: number,
  dam: 'outline' | 'box',
): VoxelFill {
  const nx = xs.length - 1,
    ny = ys.length - 1,
    nz = zs.length - 1;
  const at = (i: number, j: number, k: number): number => (k * ny + j) * nx + i;
  const cells = nx * ny * nz;
  const escape = new Float64Array(cells).fill(-Infinity);
  const queue: [number, number][] = [];
  const offer = (cell: number, height: number): void => {
    if (height > escape[cell]!) {
      escape[cell] = height;
      queue.push([height, cell]);
    }
  };
  for (let k = 0; k < nz; k++) {
    for (let j = 0; j < ny; j++) {
      for (let i = 0; i < nx; i++) {
        const out = k === nz - 1 || i === 0 || j === 0 || i === nx - 1 || j === ny - 1;
        if (out && !solid(i, j, k)) offer(at(i, j, k), zs[k + 1]!);
      }
    }
  }
  // Highest first; a plain sort per step is plenty for a few dozen cells.
  while (queue.length > 0) {
    queue.sort((a, b) => a[0] - b[0]);
    const [height, cell] = queue.pop()!;
    if (height < escape[cell]!) continue;
    const i = cell % nx,
      j = ((cell - i) / nx) % ny,
      k = Math.floor(cell / (nx * ny));
    for (let dk = -1; dk <= 1; dk++) {
      for (let dj = -1; dj <= 1; dj++) {
        for (let di = -1; di <= 1; di++) {
          const a = i + di,
            b = j + dj,
            c = k + dk;
          if (a < 0 || b < 0 || c < 0 || a >= nx || b >= ny || c >= nz || solid(a, b, c)) continue;
          offer(at(a, b, c), Math.min(height, zs[c + 1]!));
        }
      }
    }
  }
  // Regions that never get out: resting on the table they hold air from the table up.
  const zMin = zs[0]!;
  const stack: number[] = [];
  for (let j = 0; j < ny; j++) {
    for (let i = 0; i < nx; i++) {
      if (solid(i, j, 0) || escape[at(i, j, 0)] !== -Infinity) continue;
      escape[at(i, j, 0)] = zMin;
      stack.push(at(i, j, 0));
    }
  }
  while (stack.length > 0) {
    const cell = stack.pop()!;
    const i = cell % nx,
      j = ((cell - i) / nx) % ny,
      k = Math.floor(cell / (nx * ny));
    for (let dk = -1; dk <= 1; dk++) {
      for (let dj = -1; dj <= 1; dj++) {
        for (let di = -1; di <= 1; di++) {
          const a = i + di,
            b = j + dj,
            c = k + dk;
          if (a < 0 || b < 0 || c < 0 || a >= nx || b >= ny || c >= nz || solid(a, b, c) || escape[at(a, b, c)] !== -Infinity) continue;
          escape[at(a, b, c)] = zMin;
          stack.push(at(a, b, c));
        }
      }
    }
  }

  const inDam = (i: number, j: number): boolean => {
    if (dam === 'box') return true;
    for (let k = 0; k < nz; k++) if (solid(i, j, k)) return true;
    return false;
  };
  let resin = 0,
    trapped = 0,
    sealed = 0;
  for (let j = 0; j < ny; j++) {
    for (let i = 0; i < nx; i++) {
      if (!inDam(i, j)) continue;
      const area = (xs[i + 1]! - xs[i]!) * (ys[j + 1]! - ys[j]!);
      for (let k = 0; k < nz; k++) {
        if (solid(i, j, k)) continue;
        const bottom = zs[k]!,
          top = zs[k + 1]!,
          e = escape[at(i, j, k)]!;
        const below = Math.max(0, Math.min(levelMm, top) - bottom);
        if (e === -Infinity) {
          sealed += area * below;
          continue;
        }
        const held = e < top ? Math.max(0, Math.min(levelMm, top) - Math.max(bottom, e)) : 0;
        trapped += area * held;
        resin += area * (below - held);
      }
      resin += area * Math.max(0, levelMm - zs[nz]!);
    }
  }
  return { resinMm3: resin, trappedAirMm3: trapped, sealedMm3: sealed };
}
