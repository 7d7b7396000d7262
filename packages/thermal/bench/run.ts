/**
 * Exotherm forecast benchmark: `npm run bench:thermal` (node --import tsx). A generated 256 × 256
 * depth map of a 60 mm landscape cavity, poured in three 20 mm layers with a product calibrated to
 * a 50 mm / 22 °C data sheet, forecast at 24 °C. Prints the median of several runs of the whole-mould
 * forecast (depth classes), and the same columns forecast one by one as the reference, measured in
 * the same run on a sample of columns and scaled to the whole map (all of them would take minutes).
 */
import {
  calibrateToDataSheet,
  dgebaAmineDefaults,
  forecastLayer,
  forecastMould,
  peakBandsOf,
  proposeLayers,
  type PlannedLayer,
  type ResinThermal,
} from '../src/index';

function must<T>(r: { ok: true; value: T } | { ok: false; error: { message: string } }): T {
  if (!r.ok) throw new Error(r.error.message);
  return r.value;
}

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)]!;
}

function time<T>(work: () => T): { ms: number; out: T } {
  const start = performance.now();
  const out = work();
  return { ms: performance.now() - start, out };
}

const n = 256;
const cellMm = 1.2;
const depths = new Float32Array(n * n);
for (let j = 0; j < n; j++) {
  for (let i = 0; i < n; i++) {
    const x = i / (n - 1);
    const y = j / (n - 1);
    const bowl = 52 * Math.sin(Math.PI * x) * Math.sin(Math.PI * y);
    const ripple = 4 * Math.cos(9 * x) * Math.sin(7 * y) + 3 * Math.sin(13 * x + 5 * y);
    depths[j * n + i] = Math.max(0, Math.min(60, bowl + ripple + 6));
  }
}
let maxDepth = 0;
for (const d of depths) maxDepth = Math.max(maxDepth, d);
const layers: PlannedLayer[] = [0, 1, 2].map((k) => [(k * maxDepth) / 3, ((k + 1) * maxDepth) / 3]);

// An invented deep-pour product (demo numbers): published DGEBA/amine defaults, 10 h gel at 22 °C.
const product: ResinThermal = { ...dgebaAmineDefaults, gelTimeMin: 600, refTempC: 22, acceptedPeakC: 60 };
const sheet = { maxLayerMm: 50, tempC: 22 };
const calibration = time(() => must(calibrateToDataSheet(product, sheet)));
const resin = calibration.out.resin;
const conditions = { ambient: 24 };

const single = [] as number[];
for (let r = 0; r < 7; r++) single.push(time(() => must(forecastLayer(resin, conditions, 40, { series: true }))).ms);
const proposal = time(() => must(proposeLayers(resin, sheet, conditions, maxDepth)));

const runs = 7;
const mouldMs: number[] = [];
let mould = must(forecastMould(resin, conditions, { depthsMm: depths, nx: n, ny: n, cellMm }, layers));
for (let r = 0; r < runs; r++) {
  const t = time(() => must(forecastMould(resin, conditions, { depthsMm: depths, nx: n, ny: n, cellMm }, layers)));
  mouldMs.push(t.ms);
  mould = t.out;
}
// What a plan adds on top: the table from resin depth to peak that the screens paint.
const bandsMs: number[] = [];
let bandCount = 0;
for (let r = 0; r < runs; r++) {
  const t = time(() => peakBandsOf(depths, mould.peakMap));
  bandsMs.push(t.ms);
  bandCount = t.out.length;
}

// Reference: the same columns forecast one at a time (every column its own 1-D forecast per layer).
const sample = 128;
let seed = 7;
const next = () => (seed = (seed * 16807) % 2147483647) / 2147483647;
const picks: number[] = [];
while (picks.length < sample) {
  const k = Math.floor(next() * n * n);
  if (depths[k]! > 0) picks.push(k);
}
let wetColumns = 0;
for (const d of depths) if (d > 0) wetColumns++;
// The mould forecast sizes the convection correlation by each layer's wet surface (area / perimeter).
const surfaceLengthMm = layers.map(([, top]) => {
  let count = 0;
  let perimeter = 0;
  const wet = (i: number, j: number) => i >= 0 && j >= 0 && i < n && j < n && depths[j * n + i]! > 0 && maxDepth - depths[j * n + i]! < top;
  for (let j = 0; j < n; j++) {
    for (let i = 0; i < n; i++) {
      if (!wet(i, j)) continue;
      count++;
      perimeter += (wet(i - 1, j) ? 0 : 1) + (wet(i + 1, j) ? 0 : 1) + (wet(i, j - 1) ? 0 : 1) + (wet(i, j + 1) ? 0 : 1);
    }
  }
  return (count * cellMm) / perimeter;
});
let worstGapK = 0;
let minGapK = Infinity;
const perColumn = time(() => {
  for (const k of picks) {
    const floor = maxDepth - depths[k]!;
    let hottest = -Infinity;
    layers.forEach(([bottom, top], li) => {
      if (floor >= top) return;
      const resinMm = top - Math.max(bottom, floor);
      const cured = Math.max(0, bottom - floor);
      const one = must(forecastLayer(resin, { ...conditions, curedResinBelowMm: cured, surfaceLengthMm: surfaceLengthMm[li]! }, resinMm, { series: false }));
      hottest = Math.max(hottest, one.peakC);
    });
    const gap = mould.peakMap[k]! - hottest;
    worstGapK = Math.max(worstGapK, gap);
    minGapK = Math.min(minGapK, gap);
  }
});
const perColumnWholeMs = (perColumn.ms / sample) * wetColumns;

const classes = mould.layers.map((l) => l.classes);
const fmt = (ms: number) => `${ms.toFixed(1)} ms`;
console.log(`exotherm forecast benchmark (node ${process.version})`);
console.log(
  `map ${n} × ${n} columns of ${cellMm} mm, ${wetColumns} wet, deepest ${maxDepth.toFixed(1)} mm, layers ${layers.map(([b, t]) => `${b.toFixed(1)}–${t.toFixed(1)}`).join(', ')} mm`,
);
console.log(`calibration to ${sheet.maxLayerMm} mm at ${sheet.tempC} °C         ${fmt(calibration.ms)}  (${calibration.out.sentence})`);
console.log(`one 40 mm layer with its series (median of 7)  ${fmt(median(single))}`);
console.log(
  `layer proposal for ${maxDepth.toFixed(1)} mm at 24 °C          ${fmt(proposal.ms)}  (${proposal.out.layers.length} layers of ${proposal.out.layers[0]?.thicknessMm.toFixed(1)} mm)`,
);
console.log(`whole mould, depth classes (median of ${runs})    ${fmt(median(mouldMs))}  (classes per layer: ${classes.join(', ')}; budget 200 ms)`);
console.log(
  `peak table for the screens (median of ${runs})   ${fmt(median(bandsMs))}  (${bandCount} bands; with the mould ${fmt(median(mouldMs) + median(bandsMs))} of the 200 ms budget)`,
);
console.log(`reference, every column on its own             ${fmt(perColumnWholeMs)}  (scaled from ${sample} sampled columns, ${fmt(perColumn.ms)})`);
console.log(`ratio reference / classes                      ${(perColumnWholeMs / median(mouldMs)).toFixed(0)}×`);
console.log(`classes minus per-column peak on the sample    ${minGapK.toFixed(3)} to ${worstGapK.toFixed(3)} K (never below 0: classes err hot)`);
console.log(
  `hottest spot: layer ${mould.hottest!.layerIndex + 1}, column (${mould.hottest!.i}, ${mould.hottest!.j}), ${mould.hottest!.tempC.toFixed(1)} °C at ${(mould.hottest!.timeToPeakMin / 60).toFixed(1)} h`,
);
