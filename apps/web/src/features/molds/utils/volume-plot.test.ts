import { describe, expect, it } from 'vitest';
import { curveRows, plotVolumeUnit, volumePlot } from './volume-plot';

// The test block: 100 × 60 × 30 mm with an 80 × 40 × 20 mm pocket from the top, lowest point at z = 0.
// CRC Concise Encyclopedia of Mathematics: a right prism holds base area × height, so the pocket
// holds 80 × 40 × h mm³ at h mm above its floor (z = 10): 64 000 mm³ at the rim.
const pocketCurve = [
  { levelMm: 0, volumeMm3: 0 },
  { levelMm: 10, volumeMm3: 0 },
  { levelMm: 30, volumeMm3: 80 * 40 * 20 },
];
const box = { width: 400, height: 240, left: 50, right: 10, top: 10, bottom: 40 };

describe('volumePlot', () => {
  it('puts the marker at half the pocket on 32 mL', () => {
    const plot = volumePlot(pocketCurve, 0, 'metric', 20, box);
    expect(plot.marker?.volume).toBeCloseTo(32, 9);
    expect(plot.marker?.height).toBe(20);
    expect(plot.yUnit).toBe('mL');
    expect(plot.xUnit).toBe('mm');
  });

  it('draws the curve from the lower left corner to the rim', () => {
    const plot = volumePlot(pocketCurve, 0, 'metric', null, box);
    // Heckbert's nice labels (Graphics Gems, 1990): 0..30 mm in steps of 10 (nice(30) = 50, 50/4 = 12.5 → 10); 0..64 mL in steps of 20.
    expect(plot.xTicks.map((t) => t.value)).toEqual([0, 10, 20, 30]);
    expect(plot.yTicks.map((t) => t.value)).toEqual([0, 20, 40, 60, 80]);
    expect(plot.path.startsWith(`M${box.left.toFixed(2)},${(box.height - box.bottom).toFixed(2)}`)).toBe(true);
    const rimX = box.width - box.right;
    expect(plot.path.endsWith(`L${rimX.toFixed(2)},${(box.top + (box.height - box.top - box.bottom) * (1 - 64 / 80)).toFixed(2)}`)).toBe(true);
  });

  it('plots a US shop in inches and fluid ounces', () => {
    const plot = volumePlot(pocketCurve, 0, 'us', 30, box);
    // NIST SP 811: 1 US fl oz = 29.5735295625 mL; 1 in = 25.4 mm.
    expect(plot.yUnit).toBe('fl oz');
    expect(plot.marker?.volume).toBeCloseTo(64 / 29.5735295625, 9);
    expect(plot.marker?.height).toBeCloseTo(30 / 25.4, 12);
  });

  it('measures heights from the mould’s lowest point, not from the file’s zero', () => {
    const lifted = pocketCurve.map((p) => ({ ...p, levelMm: p.levelMm + 100 }));
    const plot = volumePlot(lifted, 100, 'metric', 120, box);
    expect(plot.marker?.height).toBe(20);
    expect(plot.marker?.volume).toBeCloseTo(32, 9);
  });
});

describe('plotVolumeUnit', () => {
  it('switches to litres and gallons where core’s formatter does', () => {
    expect(plotVolumeUnit(20_000, 'metric')).toEqual({ label: 'L', unit: 'L' });
    // NIST SP 811: 1 US gal = 3.785411784 L = 128 US fl oz.
    expect(plotVolumeUnit(3785.411784 * 2, 'us')).toEqual({ label: 'gal', unit: 'gal' });
  });
});

describe('curveRows', () => {
  it('samples the prism’s volume at even heights', () => {
    const rows = curveRows(pocketCurve, 0, 4);
    expect(rows.map((r) => r.heightMm)).toEqual([0, 10, 20, 30]);
    // 80 × 40 × (h − 10) mm³ above the floor (prism formula, CRC).
    expect(rows.map((r) => r.volumeMm3)).toEqual([0, 0, 32_000, 64_000]);
  });
});
