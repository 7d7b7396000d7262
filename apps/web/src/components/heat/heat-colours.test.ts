import { describe, expect, it } from 'vitest';
import { heatColour, heatPixels } from './heat-colours';

// Bands as a plan's peak map stores them: resin up to 10 mm deep peaks at 30 °C, up to 40 mm at 48 °C, up to 60 mm at 70 °C.
const bands = [
  { upToMm: 10, peakC: 30 },
  { upToMm: 40, peakC: 48 },
  { upToMm: 60, peakC: 70 },
];

describe('the forecast heat map', () => {
  it('paints a 3 × 2 map seen from above: dry columns clear, each wet column the colour of its band, the far row on top', () => {
    // Row-major from the mould's min-y edge: row 0 (near edge) is dry, 5 mm and 35 mm; row 1 (far edge) is 55 mm, dry, 9 mm.
    const map = { originMm: [0, 0] as const, cellMm: [10, 10] as const, nx: 3, ny: 2, depthsMm: [0, 5, 35, 55, 0, 9] };
    const px = heatPixels(map, bands, 20, 60);
    const at = (row: number, col: number) => Array.from(px.slice((row * 3 + col) * 4, (row * 3 + col) * 4 + 4));
    // The image's top row is the far edge (the map's row 1).
    expect(at(0, 0)).toEqual([...heatColour(70, 20, 60).map(Math.round), 255]);
    expect(at(0, 1)[3]).toBe(0);
    expect(at(0, 2)).toEqual([...heatColour(30, 20, 60).map(Math.round), 255]);
    expect(at(1, 0)[3]).toBe(0);
    expect(at(1, 1)).toEqual([...heatColour(30, 20, 60).map(Math.round), 255]);
    expect(at(1, 2)).toEqual([...heatColour(48, 20, 60).map(Math.round), 255]);
  });

  it('darkens as the peak nears the accepted one, and marks anything over it with a colour of its own', () => {
    const lightness = ([r, g, b]: readonly number[]) => 0.2126 * r! + 0.7152 * g! + 0.0722 * b!; // Rec. 709 luma weights
    const shop = 20,
      limit = 60;
    const steps = [20, 30, 40, 50, 60].map((c) => lightness(heatColour(c, shop, limit)));
    for (let i = 1; i < steps.length; i++) expect(steps[i]!).toBeLessThan(steps[i - 1]!);
    expect(heatColour(61, shop, limit)).toEqual(heatColour(90, shop, limit));
    expect(heatColour(61, shop, limit)).not.toEqual(heatColour(60, shop, limit));
  });
});
