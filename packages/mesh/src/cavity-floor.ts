import type { CavityModel } from './cavity-analysis';
import { forEachGap, gapResinTop } from './column-fill';
import type { ColumnGrid } from './column-grid';
import { checkDam, type Dam } from './dam';
import { modelOf, uncoveredAreaMm2, type CavitySource } from './fill-queries';
import { ok, type Result } from './result';

/** The lowest floor of a free gap that takes resin inside the dam, over every column; the table when none does. */
function columnFloorMm(grid: ColumnGrid, dam: Dam, zMin: number): number {
  let lowest = Infinity;
  const visit = (floor: number, ceiling: number, escape: number): void => {
    if (floor < lowest && gapResinTop(floor, ceiling, escape) > floor) lowest = floor;
  };
  const columns = grid.nx * grid.ny;
  for (let c = 0; c < columns; c++) forEachGap(grid, c, dam, zMin, visit);
  return Number.isFinite(lowest) ? lowest : zMin;
}

function floorOf(model: CavityModel, dam: Dam): number {
  const { analysis } = model;
  const zMin = analysis.bboxMm.min[2];
  if (analysis.method === 'exact') {
    // Table showing inside the dam (a box dam round a round blank, a frame open underneath): resin stands on it.
    if (uncoveredAreaMm2(model, dam) > 0) return zMin;
    // Every column is one solid on the table, so every face that looks up is open to the pour.
    if (!analysis.exact!.overhangs) return analysis.exact!.lowestFloorMm;
  }
  // Floors under overhangs may hold air or be sealed off: the columns know which gaps the resin reaches.
  // The grid is built on first read (see cavity-analysis), so only this path asks for it.
  return columnFloorMm(model.grid, dam, zMin);
}

/**
 * The cavity floor (mm, in the mould's own Z-up frame): the lowest point where resin stands with the
 * given dam, that is the level above which the fill volume starts to grow. Fill levels "from the floor"
 * are heights of the resin surface above it. The exact method answers it from its closed-form facts;
 * otherwise the column grid does, to within how well a column's centre stands for its cell.
 */
export function cavityFloorMm(source: CavitySource, dam: Dam = 'outline'): Result<number> {
  const model = modelOf(source);
  if (!model.ok) return model;
  const checked = checkDam(dam);
  if (!checked.ok) return checked;
  return ok(floorOf(model.value, checked.value));
}
