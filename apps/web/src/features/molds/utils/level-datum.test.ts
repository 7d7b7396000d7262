import { describe, expect, it } from 'vitest';
import { curveAboveFloor, curveFromLayers, levelsToRim, rimAboveFloorMm, storedFillToTop } from './level-datum';

// A 100 × 60 × 30 mm block with an 80 × 40 mm pocket floored at z = 10: a right prism holds base × height
// (CRC Concise Encyclopedia of Mathematics), 3200 mm³ per millimetre above the floor.
const reportCurve = [
  { levelMm: 0, volumeMm3: 0 },
  { levelMm: 6, volumeMm3: 0 },
  { levelMm: 10, volumeMm3: 0 },
  { levelMm: 20, volumeMm3: 32_000 },
  { levelMm: 30, volumeMm3: 64_000 },
];

describe('the floor datum on the mould page', () => {
  it('measures the curve from the floor: the wood below it is not on the axis', () => {
    expect(curveAboveFloor(reportCurve, 10)).toEqual([
      { levelMm: 0, volumeMm3: 0 },
      { levelMm: 10, volumeMm3: 32_000 },
      { levelMm: 20, volumeMm3: 64_000 },
    ]);
    // A floor between samples starts the curve there, with the volume the curve holds at it.
    expect(curveAboveFloor(reportCurve, 15)[0]).toEqual({ levelMm: 0, volumeMm3: 16_000 });
  });

  it('runs the level from 0 at the floor to the rim', () => {
    const report = { floorMm: { outline: 10, box: 0 }, bboxMm: { min: [0, 0, 0] as [number, number, number], max: [100, 60, 30] as [number, number, number] } };
    expect(rimAboveFloorMm(report, 'outline')).toBe(20);
    expect(rimAboveFloorMm(report, 'box')).toBe(30);
    const levels = levelsToRim(20, 101);
    expect(levels[0]).toBe(0);
    expect(levels.at(-1)).toBe(20);
    expect(levels).toHaveLength(101);
  });

  it('adds layer volumes into a curve from the floor', () => {
    const curve = curveFromLayers({
      layers: [
        { fromMm: 0, toMm: 10, volumeMm3: 32_000 },
        { fromMm: 10, toMm: 20, volumeMm3: 32_000 },
      ],
    });
    expect(curve).toEqual([
      { levelMm: 0, volumeMm3: 0 },
      { levelMm: 10, volumeMm3: 32_000 },
      { levelMm: 20, volumeMm3: 64_000 },
    ]);
  });

  it('reads the stored fill to the top as a level above the floor', () => {
    const fillToTop = { levelMm: 30, dam: 'outline' as const, volumeMm3: 64_000, wettedAreaMm2: 8960, maxDepthMm: 20, trappedAirMm3: 0, warnings: [] };
    expect(storedFillToTop({ fillToTop, floorMm: { outline: 10, box: 0 } })).toMatchObject({
      levelMm: 20,
      levelFrom: 'floor',
      floorMm: 10,
      levelAboveFloorMm: 20,
      levelInMouldMm: 30,
    });
  });
});
