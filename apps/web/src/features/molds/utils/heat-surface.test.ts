import { Mesh, PlaneGeometry, Raycaster, Vector3 } from 'three';
import { describe, expect, it } from 'vitest';
import { heatColour } from '../../../components/heat/heat-colours';
import { heatSurface } from './heat-surface';

// Demo peak table: resin up to 10 mm deep peaks at 30 °C, up to 40 mm at 48 °C, up to 60 mm at 70 °C.
const bands = [
  { upToMm: 10, peakC: 30 },
  { upToMm: 40, peakC: 48 },
  { upToMm: 60, peakC: 70 },
];
const shopTempC = 20;
const limitC = 80;
const levelMm = 42;

// A 3 × 2 map with 10 × 20 mm cells from (100, 200), rows from the near (min y) edge. Lopsided on purpose: only the far
// right column (max x, max y) reaches the 70 °C band, only the near left one stays at 30 °C, the near middle is dry.
const map = { originMm: [100, 200] as const, cellMm: [10, 20] as const, nx: 3, ny: 2, depthsMm: [5, 0, 35, 35, 35, 55] };
const peakMap = { bands, hottest: { xMm: 125, yMm: 230, layerIndex: 0, peakC: 70, timeToPeakMin: 300 } };
const rgba = (peakC: number) => [...heatColour(peakC, shopTempC, limitC).map(Math.round), 255];

/**
 * The colour three would paint at (x, y) of the surface: the plane as three builds it, hit from above by three's own
 * ray caster for its texture coordinate, then the texel there, first row at v = 0 as glTexImage2D lays a texture
 * uploaded unflipped ("the first element corresponds to the lower left corner of the texture image", OpenGL reference
 * page for glTexImage2D; three's DataTexture leaves flipY off).
 */
function paintedAt(surface: ReturnType<typeof heatSurface>, xMm: number, yMm: number): number[] | null {
  const plane = new Mesh(new PlaneGeometry(surface.sizeMm[0], surface.sizeMm[1]));
  plane.position.set(surface.centreMm[0], surface.centreMm[1], levelMm);
  plane.updateMatrixWorld();
  const hit = new Raycaster(new Vector3(xMm, yMm, levelMm + 100), new Vector3(0, 0, -1)).intersectObject(plane)[0];
  if (!hit?.uv) return null;
  const col = Math.min(surface.nx - 1, Math.floor(hit.uv.x * surface.nx));
  const row = Math.min(surface.ny - 1, Math.floor(hit.uv.y * surface.ny));
  return Array.from(surface.pixels.slice((row * surface.nx + col) * 4, (row * surface.nx + col) * 4 + 4));
}

describe('the forecast peak on the 3D resin surface', () => {
  const surface = heatSurface({ map, peakMap, shopTempC, limitC });

  it('covers the depth map exactly: from its min corner, one cell per column', () => {
    expect(surface.sizeMm).toEqual([30, 40]);
    expect(surface.centreMm).toEqual([115, 220]);
  });

  it("lands each column's colour on that column, the hot one in the far right corner as on the top-down map", () => {
    const centre = (i: number, j: number) => [100 + (i + 0.5) * 10, 200 + (j + 0.5) * 20] as const;
    expect(paintedAt(surface, ...centre(0, 0))).toEqual(rgba(30));
    expect(paintedAt(surface, ...centre(1, 0))?.[3]).toBe(0);
    expect(paintedAt(surface, ...centre(2, 0))).toEqual(rgba(48));
    expect(paintedAt(surface, ...centre(0, 1))).toEqual(rgba(48));
    expect(paintedAt(surface, ...centre(1, 1))).toEqual(rgba(48));
    expect(paintedAt(surface, ...centre(2, 1))).toEqual(rgba(70));
    // Near each corner of the mould's plan, a hair inside it.
    expect(paintedAt(surface, 129.9, 239.9)).toEqual(rgba(70));
    expect(paintedAt(surface, 100.1, 200.1)).toEqual(rgba(30));
  });

  it('puts the hottest-spot marker on a column painted in the hottest colour', () => {
    expect(surface.hottestMm).toEqual([125, 230]);
    expect(paintedAt(surface, ...surface.hottestMm)).toEqual(rgba(peakMap.hottest.peakC));
  });
});
