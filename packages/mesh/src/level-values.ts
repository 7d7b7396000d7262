import { LevelQuantity, levelQuantityCount, readLevelFace, type LevelFace } from './level-series';
import { triangleBelow, type TriangleBelow } from './triangle-fill';
import type { TriangleTable } from './triangle-table';
import type { WettingClasses } from './wetting-classes';

/** The level quantities at a few levels, each summed exactly: what the series' knots hold at those levels. */
export interface LevelValues {
  levels: Float64Array;
  /** Quantity q at levels[k]: values[q * levels.length + k], the limit from below. */
  values: Float64Array;
}

/**
 * Every level quantity of level-series (resin on faces that look up, columns under raised faces
 * that look down, held and sealed air, wetted area with either dam) at each of a few levels, as
 * the plain sum over the faces of their closed forms (triangle-fill), limits from below at corner
 * heights, exactly as the series' samples take them. One pass over the faces and no knots, so a
 * question about one level costs a small part of the whole series; the series stays the answer
 * for any other level. Levels at or below the mould's lowest z read 0, as the series does there.
 */
export function levelValues(levels: Float64Array, table: TriangleTable, classes: WettingClasses, escape: Float64Array | null, zMin: number): LevelValues {
  const sums = new LevelSums(levels, zMin);
  const face: LevelFace = { z0: 0, z1: 0, z2: 0, escape: 0, up: false, down: false, wetQ: -1 };
  const measures: FaceMeasures = { shadowArea: 0, area: 0, facing: 0 };
  for (let t = 0; t < table.count; t++) {
    readLevelFace(table, classes, escape, zMin, t, face);
    measures.shadowArea = table.shadowArea[t]!;
    measures.area = table.area[t]!;
    measures.facing = table.facing[t]!;
    sums.add(face, measures);
  }
  return { levels, values: sums.values };
}

/** A face's signed shadow (negative when it looks down), area and facing (1 up, -1 down, 0 a wall); a FaceGeometry has them. */
export interface FaceMeasures {
  shadowArea: number;
  area: number;
  facing: number;
}

/** The sums of levelValues, face by face, in any order. */
export class LevelSums {
  readonly values: Float64Array;
  private readonly at: TriangleBelow = { share: 0, shareSlope: 0, depth: 0 };

  constructor(
    readonly levels: Float64Array,
    private readonly zMin: number,
  ) {
    this.values = new Float64Array(levelQuantityCount * levels.length);
  }

  /**
   * Adds one face: `face` as readLevelFace fills it, with the face's signed shadow, area and
   * facing. Both are objects filled again face after face: numbers passed one by one would each be
   * boxed on the heap where the call is not inlined.
   */
  add(face: LevelFace, measures: FaceMeasures): void {
    const { z0, z1, z2, escape: e, up, down, wetQ } = face;
    const { shadowArea: signedShadow, area, facing } = measures;
    // Every test is made on every face, none skipped by && (a test first met a million faces in
    // would throw the compiled code away and box numbers on the heap until it is compiled again).
    const escapes = e !== Infinity,
      turned = facing !== 0,
      dry = wetQ < 0;
    const held = escapes && turned;
    if (!up && !down && dry && !held) return;
    const { levels, values, zMin, at } = this;
    const n = levels.length;
    const shadow = Math.abs(signedShadow);
    const mean = (z0 + z1 + z2) / 3;
    // Above its escape height a face is held dry by air: what was wet below it stays so.
    let frozen = area;
    if (wetQ >= 0 && e !== Infinity) {
      triangleBelow(z0, z1, z2, e, false, at);
      frozen = area * at.share;
    }
    // Held air: w·[(h − s) + depth(s) − depth(h)] from its escape height s up to the face's top, then constant.
    const q = e === -Infinity ? LevelQuantity.Sealed : LevelQuantity.Trapped;
    const s = e === -Infinity ? zMin : e;
    const w = -signedShadow;
    let depthAtS = 0;
    if (held) {
      triangleBelow(z0, z1, z2, s, false, at);
      depthAtS = at.depth;
    }
    for (let k = 0; k < n; k++) {
      const h = levels[k]!;
      if (!(h > zMin)) continue;
      if (h <= z0) {
        // Nothing of the face is below h; a raised face that looks down has the column from the table up to h under it.
        if (down) values[LevelQuantity.Down * n + k]! += shadow * (h - zMin);
      } else if (h > z2) {
        if (up) values[LevelQuantity.Up * n + k]! += shadow * (h - mean);
        if (down) values[LevelQuantity.Down * n + k]! += shadow * (mean - zMin);
        if (wetQ >= 0) values[wetQ * n + k]! += h <= e ? area : frozen;
      } else {
        triangleBelow(z0, z1, z2, h, false, at);
        if (up) values[LevelQuantity.Up * n + k]! += shadow * at.depth;
        if (down) values[LevelQuantity.Down * n + k]! += shadow * (h - zMin - at.depth);
        if (wetQ >= 0) values[wetQ * n + k]! += h <= e ? area * at.share : frozen;
      }
      if (held && h > s) {
        if (h > z2) {
          values[q * n + k]! += w * (mean - s + depthAtS);
        } else {
          triangleBelow(z0, z1, z2, h, false, at);
          values[q * n + k]! += w * (h - s + depthAtS - at.depth);
        }
      }
    }
  }
}
