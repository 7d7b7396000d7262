import { describe, expect, it } from 'vitest';
import { temperaturePlot, type PlotFrame } from './temperature-plot';

const frame: PlotFrame = { width: 600, height: 240, left: 40, right: 20, top: 20, bottom: 20 };
const product = { referenceTempC: 22, minWorkTempC: 16 };

// Coordinates are the affine map of SVG user space, worked by hand:
// x = left + (t − t0)/(t1 − t0)·(width − left − right), y = top + (high − T)/(high − low)·(height − top − bottom).
describe('temperaturePlot', () => {
  it('draws straight lines between close readings, then the last reading carried and a gap at the lower temperature', () => {
    const plot = temperaturePlot({
      readings: [
        { at: '2026-03-01T00:00:00Z', tempC: 20 },
        { at: '2026-03-01T03:00:00Z', tempC: 14 },
      ],
      pouredAt: '2026-03-01T00:00:00Z',
      asOf: '2026-03-01T12:00:00Z',
      assumedTempC: 21,
      readingCarryH: 2,
      product,
      unitSystem: 'metric',
      frame,
    });
    expect(plot).not.toBeNull();
    const p = plot!;
    // Temperatures 14, 20 and the 16 °C minimum on 5 °C steps: 10 to 20 °C.
    expect(p.yTicks.map((t) => t.value)).toEqual([10, 15, 20]);
    expect(p.spans.map((s) => s.source)).toEqual(['logged', 'carried', 'gap']);
    const [logged, carried, gap] = p.spans;
    expect(logged!.x1).toBeCloseTo(40, 9);
    // 3 h of 12 h across 540 units: 40 + 135.
    expect(logged!.x2).toBeCloseTo(175, 9);
    // 20 °C on 10..20 over 200 units: the top, 20; 14 °C: 20 + 6/10·200.
    expect(logged!.y1).toBeCloseTo(20, 9);
    expect(logged!.y2).toBeCloseTo(20 + (6 / 10) * 200, 9);
    expect(logged!.temp).toBe(17);
    // 14 °C carried 2 h (to 05:00: 40 + 5/12·540), then the gap at min(14, 21) = 14 °C to the right edge.
    expect(carried!.x2).toBeCloseTo(40 + (5 / 12) * 540, 9);
    expect(gap!.temp).toBe(14);
    expect(gap!.x2).toBeCloseTo(580, 9);
    // 16 °C: 20 + 4/10·200.
    expect(p.minimum.y).toBeCloseTo(20 + (4 / 10) * 200, 9);
    expect(p.dots).toHaveLength(2);
  });

  it('marks a span below the minimum', () => {
    const plot = temperaturePlot({
      readings: [
        { at: '2026-03-01T00:00:00Z', tempC: 12 },
        { at: '2026-03-01T04:00:00Z', tempC: 18 },
      ],
      pouredAt: '2026-03-01T00:00:00Z',
      asOf: '2026-03-01T04:00:00Z',
      assumedTempC: 20,
      readingCarryH: 2,
      product,
      unitSystem: 'metric',
      frame,
    });
    // One logged interval at the average (12 + 18)/2 = 15 °C, under the 16 °C minimum.
    expect(plot?.spans).toHaveLength(1);
    expect(plot?.spans[0]?.belowMinimum).toBe(true);
  });

  it('plots a US shop in °F on 10 °F steps', () => {
    // NIST SP 811: 20 °C = 68 °F, 16 °C = 60.8 °F.
    const plot = temperaturePlot({
      readings: [{ at: '2026-03-01T00:00:00Z', tempC: 20 }],
      pouredAt: '2026-03-01T00:00:00Z',
      asOf: '2026-03-01T02:00:00Z',
      assumedTempC: 20,
      readingCarryH: 2,
      product,
      unitSystem: 'us',
      frame,
    });
    expect(plot?.unit).toBe('°F');
    expect(plot?.dots[0]?.temp).toBeCloseTo(68, 9);
    expect(plot?.minimum.temp).toBeCloseTo(60.8, 9);
    expect(plot?.yTicks.map((t) => t.value)).toEqual([60, 70]);
  });

  it('draws the assumed temperature alone before any reading is logged', () => {
    const plot = temperaturePlot({
      readings: [],
      pouredAt: '2026-03-01T00:00:00Z',
      asOf: '2026-03-01T03:00:00Z',
      assumedTempC: 19,
      readingCarryH: 2,
      product,
      unitSystem: 'metric',
      frame,
    });
    expect(plot?.spans.map((s) => s.source)).toEqual(['assumed']);
    expect(plot?.dots).toEqual([]);
  });

  it('counts only from the pour, even when the page’s clock lags behind it', () => {
    const plot = temperaturePlot({
      readings: [
        { at: '2026-03-01T00:00:00Z', tempC: 20 },
        { at: '2026-03-01T02:00:00Z', tempC: 21 },
      ],
      pouredAt: '2026-03-01T06:00:00Z',
      asOf: '2026-03-01T05:59:30Z',
      assumedTempC: 19,
      readingCarryH: 2,
      product,
      unitSystem: 'metric',
      frame,
    });
    // The readings before the pour are shown as dots but add no cure, as in core's windowed sum.
    expect(plot?.dots).toHaveLength(2);
    expect(plot?.spans).toEqual([]);
    // 6 h of 6 h: the right edge, 40 + 540.
    expect(plot?.pouredX).toBeCloseTo(580, 9);
  });

  it('has nothing to plot with neither readings nor a pour', () => {
    expect(
      temperaturePlot({ readings: [], pouredAt: null, asOf: '2026-03-01T03:00:00Z', assumedTempC: 19, readingCarryH: 2, product, unitSystem: 'metric', frame }),
    ).toBeNull();
  });

  it('draws the forecast ahead as steps, the night dip lower on the plot, with now marked where it starts', () => {
    const plot = temperaturePlot({
      readings: [{ at: '2026-03-01T00:00:00Z', tempC: 20 }],
      pouredAt: '2026-03-01T00:00:00Z',
      asOf: '2026-03-01T06:00:00Z',
      assumedTempC: 20,
      readingCarryH: 2,
      product,
      unitSystem: 'metric',
      frame,
      ahead: [
        { from: '2026-03-01T06:00:00Z', to: '2026-03-01T12:00:00Z', tempC: 20 },
        { from: '2026-03-01T12:00:00Z', to: '2026-03-01T18:00:00Z', tempC: 12 },
      ],
    })!;
    // From 00:00 to 18:00 over 540 units: 06:00 is at 40 + 540/3 = 220, 12:00 at 400, 18:00 at 580.
    expect(plot.nowX).toBeCloseTo(220, 9);
    expect(plot.forecast.map((f) => [f.x1, f.x2])).toEqual([
      [expect.closeTo(220, 9), expect.closeTo(400, 9)],
      [expect.closeTo(400, 9), expect.closeTo(580, 9)],
    ]);
    // 12, 16 and 20 °C on 5 °C steps: 10 to 20 °C over 200 units; 12 °C sits at 20 + (20 − 12)/10·200 = 180.
    expect(plot.forecast[1]!.y).toBeCloseTo(180, 9);
    expect(plot.forecast[1]!.y).toBeGreaterThan(plot.forecast[0]!.y);
  });

  it('draws the history as the server counted it when given, cut at the moment it is drawn for', () => {
    const plot = temperaturePlot({
      readings: [],
      pouredAt: '2026-03-01T00:00:00Z',
      asOf: '2026-03-01T10:00:00Z',
      assumedTempC: 20,
      readingCarryH: 2,
      product,
      unitSystem: 'metric',
      frame,
      history: [
        { from: '2026-03-01T00:00:00Z', to: '2026-03-01T08:00:00Z', source: 'assumed', tempC: 20, startTempC: 20, endTempC: 20, belowMinimum: false },
        { from: '2026-03-01T08:00:00Z', to: '2026-03-01T14:00:00Z', source: 'assumed', tempC: 14, startTempC: 14, endTempC: 14, belowMinimum: true },
      ],
    })!;
    expect(plot.spans.map((s) => [s.from, s.temp])).toEqual([
      ['2026-03-01T00:00:00Z', 20],
      ['2026-03-01T08:00:00Z', 14],
    ]);
    expect(plot.toMs).toBe(Date.parse('2026-03-01T10:00:00Z'));
  });
});
