import { describe, expect, it } from 'vitest';
import type { DepthMap } from '../types';
import { bandIndex, summariseDepthMap } from './depth-bands';

/** A 100 × 60 mm grid of 10 mm columns holding a stepped pocket: 20 mm deep on 8 columns, 5 mm on 4, dry elsewhere. */
function steppedPocket(): DepthMap {
  const nx = 10;
  const ny = 6;
  const depthsMm = new Array<number>(nx * ny).fill(0);
  for (const ix of [2, 3, 4, 5]) for (const iy of [2, 3]) depthsMm[iy * nx + ix] = 20;
  for (const ix of [6, 7]) for (const iy of [2, 3]) depthsMm[iy * nx + ix] = 5;
  return { originMm: [0, 0], cellMm: [10, 10], nx, ny, depthsMm };
}

describe('summariseDepthMap', () => {
  it('finds the deepest column and where it stands', () => {
    const summary = summariseDepthMap(steppedPocket());
    expect(summary.deepest).toMatchObject({ ix: 2, iy: 2, depthMm: 20, xMm: 25, yMm: 25 });
    expect(summary.wetCells).toBe(12);
    expect(summary.footprintMm2).toBe(1200);
  });

  it('bands the depths at nice round edges and shares the footprint between them', () => {
    // Heckbert's nice labels (Graphics Gems, 1990) over 0..20 mm with 6 ticks: nice(20) = 20, 20 / 5 = 4 → 5 mm steps.
    const summary = summariseDepthMap(steppedPocket());
    expect(summary.edgesMm).toEqual([0, 5, 10, 15, 20]);
    expect(summary.bands.map((b) => b.cells)).toEqual([4, 0, 0, 8]);
    expect(summary.bands.map((b) => Math.round(b.sharePct * 100) / 100)).toEqual([33.33, 0, 0, 66.67]);
    expect(summary.bands.reduce((sum, b) => sum + b.areaMm2, 0)).toBe(summary.footprintMm2);
  });

  it('gives each band its own colour', () => {
    const colours = summariseDepthMap(steppedPocket()).bands.map((b) => b.colour);
    expect(new Set(colours).size).toBe(colours.length);
  });

  it('says there is no resin for a dry map', () => {
    const dry: DepthMap = { originMm: [0, 0], cellMm: [1, 1], nx: 2, ny: 2, depthsMm: [0, 0, 0, 0] };
    const summary = summariseDepthMap(dry);
    expect(summary.deepest).toBeNull();
    expect(summary.bands).toEqual([]);
  });
});

describe('bandIndex', () => {
  it('puts a depth on an edge into the band below it, and dry columns nowhere', () => {
    const edges = [0, 5, 10];
    expect(bandIndex(5, edges)).toBe(0);
    expect(bandIndex(5.01, edges)).toBe(1);
    expect(bandIndex(0, edges)).toBe(-1);
  });
});
