import { heatColumns, type ForecastHeat, type HeatDepthMap } from '../../../components/heat/heat-colours';

/** A rectangle on the mould's plan: where a depth map's plane sits, in the mould's own frame (mm). */
export interface MapPlane {
  centreMm: [number, number];
  sizeMm: [number, number];
}

/** The plane a depth map covers: from its min x, min y corner, one cell per column. */
export function mapPlane(map: Pick<HeatDepthMap, 'originMm' | 'cellMm' | 'nx' | 'ny'>): MapPlane {
  const sizeMm: [number, number] = [map.nx * map.cellMm[0], map.ny * map.cellMm[1]];
  return { centreMm: [map.originMm[0] + sizeMm[0] / 2, map.originMm[1] + sizeMm[1] / 2], sizeMm };
}

export interface HeatSurface extends MapPlane {
  nx: number;
  ny: number;
  /**
   * RGBA per column in the depth map's own order: row 0 is the plane's −y edge, which is where a texture uploaded
   * without flipping (three's DataTexture default) puts its first row, so the colours sit on their own columns.
   */
  pixels: Uint8Array;
  /** The hottest column of the forecast, on the plane (mm). */
  hottestMm: [number, number];
}

/** The forecast peak over the resin surface: each column coloured on the top-down map's own scale. */
export function heatSurface(heat: ForecastHeat): HeatSurface {
  const { map, peakMap, shopTempC, limitC } = heat;
  const columns = heatColumns(map, peakMap.bands, shopTempC, limitC);
  return {
    ...mapPlane(map),
    nx: map.nx,
    ny: map.ny,
    pixels: new Uint8Array(columns.buffer, columns.byteOffset, columns.length),
    hottestMm: [peakMap.hottest.xMm, peakMap.hottest.yMm],
  };
}
