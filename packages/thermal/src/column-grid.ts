/**
 * The finite-volume grid of one column: nodes from the resin surface (depth 0) down through the
 * fresh resin and whatever lies under it. Each node owns half of the cell above and half of the
 * cell below; a material boundary falls on a node, so each half keeps its own properties.
 * A sphere (a cup of mixed resin) uses the same depth coordinate measured in from its surface.
 */

export type Geometry = 'slab' | 'sphere';

export interface Material {
  conductivityWPerMK: number;
  /** ρ·c, J/(m³·K). */
  volumetricHeatJPerM3K: number;
}

export interface GridSegment {
  material: Material;
  thicknessM: number;
  /** Fresh resin that reacts; everything else (cured resin, wood) only stores and conducts heat. */
  reacting: boolean;
  /** Cell sizes, top to bottom, summing to thicknessM. */
  cellsM: number[];
}

export interface ColumnGrid {
  geometry: Geometry;
  /** Node depths below the surface, m. */
  depthM: Float64Array;
  /** Heat capacity of each node's control volume, J/K per unit of the geometry's area measure. */
  capacity: Float64Array;
  /** Conductance between node i and node i + 1, W/K in the same measure. */
  conductance: Float64Array;
  /** Volume of reacting resin in each node's control volume (only the first reactingNodes are non-zero). */
  reactingVolume: Float64Array;
  reactingNodes: number;
  /** Area measure of the surface (1 for a slab, R² for a sphere; 4π cancels everywhere). */
  surfaceArea: number;
}

/** Cells growing by at most `ratio` from `firstM`, scaled to fill `lengthM` exactly. */
export function geometricCells(lengthM: number, firstM: number, ratio: number): number[] {
  if (lengthM <= firstM * 1.5) return [lengthM];
  const count = Math.ceil(Math.log(1 + (lengthM * (ratio - 1)) / firstM) / Math.log(ratio));
  const sizes: number[] = [];
  let sum = 0;
  for (let i = 0; i < count; i++) {
    const s = firstM * ratio ** i;
    sizes.push(s);
    sum += s;
  }
  const scale = lengthM / sum;
  return sizes.map((s) => s * scale);
}

export function uniformCells(lengthM: number, count: number): number[] {
  return Array.from({ length: count }, () => lengthM / count);
}

export function buildColumnGrid(geometry: Geometry, segments: GridSegment[]): ColumnGrid {
  const cells: { size: number; material: Material; reacting: boolean }[] = [];
  for (const seg of segments) for (const size of seg.cellsM) cells.push({ size, material: seg.material, reacting: seg.reacting });
  const totalM = cells.reduce((s, c) => s + c.size, 0);
  const nodes = cells.length + 1;
  const depthM = new Float64Array(nodes);
  for (let i = 0; i < cells.length; i++) depthM[i + 1] = depthM[i]! + cells[i]!.size;

  const radius = totalM;
  const area = (z: number) => (geometry === 'slab' ? 1 : (radius - z) ** 2);
  const volume = (z1: number, z2: number) => (geometry === 'slab' ? z2 - z1 : ((radius - z1) ** 3 - (radius - z2) ** 3) / 3);

  const capacity = new Float64Array(nodes);
  const reactingVolume = new Float64Array(nodes);
  const conductance = new Float64Array(nodes - 1);
  let reactingNodes = 0;
  for (let i = 0; i < cells.length; i++) {
    const cell = cells[i]!;
    const top = depthM[i]!;
    const bottom = depthM[i + 1]!;
    const mid = (top + bottom) / 2;
    const upperHalf = volume(top, mid);
    const lowerHalf = volume(mid, bottom);
    capacity[i] = capacity[i]! + upperHalf * cell.material.volumetricHeatJPerM3K;
    capacity[i + 1] = capacity[i + 1]! + lowerHalf * cell.material.volumetricHeatJPerM3K;
    if (cell.reacting) {
      reactingVolume[i] = reactingVolume[i]! + upperHalf;
      reactingVolume[i + 1] = reactingVolume[i + 1]! + lowerHalf;
      reactingNodes = i + 2;
    }
    conductance[i] = (cell.material.conductivityWPerMK * area(mid)) / cell.size;
  }
  return { geometry, depthM, capacity, conductance, reactingVolume, reactingNodes, surfaceArea: area(0) };
}
