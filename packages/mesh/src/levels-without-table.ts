import { pageSized } from './page-sized';
import { wettedQuantity, type LevelFace } from './level-series';
import { LevelSums, type LevelValues } from './level-values';
import { OverhangSurvey } from './overhang-survey';
import { faceGeometry, type FaceGeometry } from './triangle-table';
import { faceWetting, WallRays, type WettingClasses, type WettingFrame } from './wetting-classes';

export interface LevelsWithoutTable {
  survey: OverhangSurvey;
  classes: WettingClasses;
  values: LevelValues;
}

/**
 * What a closed mould asked about a few levels needs, in one pass over its faces straight from its
 * vertices: the overhang survey, the wetting classes and every level quantity at those levels,
 * which otherwise come from three passes over the triangle table. The table (42 bytes a face, most
 * of the memory a big mould's report touches) is then built only if the series or the columns are
 * read. Null as soon as a face hangs over free space: the air it may hold needs the table (escape
 * heights). The sums take the faces in another order than levelValues (walls whose wetting a ray
 * decides come last), so they agree with it to rounding.
 */
export function levelsWithoutTable(
  positions: Float64Array,
  triangles: Uint32Array,
  levels: Float64Array,
  height: number,
  tableToleranceMm: number,
  frame: WettingFrame,
): LevelsWithoutTable | null {
  const count = triangles.length / 3;
  const zMin = frame.zMin;
  const wet = pageSized(Uint8Array, count);
  const facing = pageSized(Int8Array, count);
  const survey = new OverhangSurvey(zMin, height, tableToleranceMm);
  const sums = new LevelSums(levels, zMin);
  const walls = new WallRays();
  const g: FaceGeometry = { shadowArea: 0, area: 0, facing: 0, steep: false, z0: 0, z1: 0, z2: 0 };
  // Nothing hangs over free space, so no air is held anywhere: no face has an escape height.
  const face: LevelFace = { z0: 0, z1: 0, z2: 0, escape: Infinity, up: false, down: false, wetQ: -1 };
  const take = (t: number, wetting: number, columns: boolean): void => {
    face.z0 = g.z0;
    face.z1 = g.z1;
    face.z2 = g.z2;
    face.up = columns && g.facing > 0;
    face.down = columns && g.facing < 0 && g.z2 > zMin;
    face.wetQ = wettedQuantity(wetting);
    sums.add(face, g);
    wet[t] = wetting;
  };
  for (let t = 0; t < count; t++) {
    faceGeometry(positions, triangles, t, g);
    facing[t] = g.facing;
    survey.add(g);
    if (survey.present) return null;
    if (g.steep) walls.add(positions, triangles, t, frame);
    take(t, g.steep ? 0 : faceWetting(g.facing, g.z2, frame), true);
  }
  // A wall's wetting is what its ray finds: its wetted part is added once that is known.
  walls.cast(positions, triangles, facing, frame, (t, bits) => {
    faceGeometry(positions, triangles, t, g);
    take(t, bits, false);
  });
  return { survey, classes: { wet }, values: { levels, values: sums.values } };
}
