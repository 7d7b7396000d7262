import type { Ambient } from './ambient';
import type { ColumnGrid } from './column-grid';
import { coupledStep, stepScratch } from './coupled-step';
import type { RateLaw } from './kinetics';

/**
 * The run of one column from pouring until its peak is certain. Each step is the coupled implicit
 * step of coupled-step.ts; the step size adapts so that no node's temperature moves more than
 * `stepKelvin` and no conversion more than `stepConversion` in one step: small steps through a
 * runaway, large ones while nothing happens. A step that overshoots twice its allowance, or whose
 * Newton iteration does not settle, is taken again at half the size.
 */
export interface ColumnRunInput {
  grid: ColumnGrid;
  law: RateLaw;
  /** ρ·ΔH of the fresh resin, J/m³ per unit of conversion. */
  reactionHeatJPerM3: number;
  /** Total surface coefficient (convection + radiation), W/(m²·K), from the surface and air temperatures. */
  surfaceH: (surfaceC: number, airC: number) => number;
  ambient: Ambient;
  initialTempC: (depthM: number, reacting: boolean) => number;
  initialConversion: number;
  stepKelvin: number;
  stepConversion: number;
  maxStepS: number;
  /** The run stops here at the latest. */
  endS: number;
  /** 'peak': stop once no later heating can beat the peak; 'fixed': run to endS. */
  until: 'peak' | 'fixed';
  /** Keep every step's resin temperatures and conversions (for series). */
  record: boolean;
  /** Stop as soon as the resin reaches this conversion (a pot-life clock). */
  stopAtConversion?: number;
  /** Whose conversion stops the clock: the most-cured node (default) or the resin's volume-weighted mean. */
  stopConversionOf?: 'first_node' | 'mean';
  /** Stop as soon as the peak passes this temperature (a search only needs to know that it did). */
  stopAboveC?: number;
}

export interface ColumnRecord {
  timeS: number[];
  /** Per step, the temperatures of the reacting nodes. */
  temps: Float32Array[];
  conversions: Float32Array[];
}

export interface ColumnRun {
  peakC: number;
  peakTimeS: number;
  peakDepthM: number;
  /** Reacting node nearest the peak. */
  peakNode: number;
  endS: number;
  steps: number;
  rejectedSteps: number;
  /** True when the run stopped at endS before its own stopping rule was met. */
  hitEnd: boolean;
  /** Time the first reacting node reached stopAtConversion, when asked. */
  conversionReachedS: number | null;
  /**
   * True when the resin reached its adiabatic ceiling (the warmest start plus ΔH/cp): heat leaves far
   * slower than the reaction makes it, a runaway. The run stops there: past it the front through the
   * layer is thinner than any practical grid, and the real resin is decomposing anyway.
   */
  runaway: boolean;
  /** True when the run stopped because the peak passed stopAboveC. */
  passedStopAbove: boolean;
  finalTempC: Float64Array;
  finalConversion: Float64Array;
  record: ColumnRecord | null;
}

function parabolaVertex(x0: number, y0: number, x1: number, y1: number, x2: number, y2: number): { x: number; y: number } {
  const d1 = (y1 - y0) / (x1 - x0);
  const d2 = (y2 - y1) / (x2 - x1);
  const a = (d2 - d1) / (x2 - x0);
  if (!(a < 0)) return { x: x1, y: y1 };
  const b = d1 - a * (x0 + x1);
  const x = Math.min(x2, Math.max(x0, -b / (2 * a)));
  return { x, y: y0 + (x - x0) * (d1 + a * (x - x1)) };
}

export function runColumn(input: ColumnRunInput): ColumnRun {
  const { grid, law, ambient } = input;
  const nodes = grid.capacity.length;
  const nr = grid.reactingNodes;
  const z = grid.depthM;
  const temp = new Float64Array(nodes);
  const alpha = new Float64Array(nr);
  const savedTemp = new Float64Array(nodes);
  const savedAlpha = new Float64Array(nr);
  let maxRise = 0;
  for (let i = 0; i < nodes; i++) temp[i] = input.initialTempC(z[i]!, i < nr);
  for (let i = 0; i < nr; i++) {
    alpha[i] = input.initialConversion;
    maxRise = Math.max(maxRise, (grid.reactingVolume[i]! * input.reactionHeatJPerM3) / grid.capacity[i]!);
  }
  const heat = new Float64Array(nr);
  for (let i = 0; i < nr; i++) heat[i] = grid.reactingVolume[i]! * input.reactionHeatJPerM3;
  const system = { grid, law, heat };
  const scratch = stepScratch(nodes, nr);

  const record: ColumnRecord | null = input.record ? { timeS: [], temps: [], conversions: [] } : null;
  const keep = (t: number) => {
    if (!record) return;
    record.timeS.push(t);
    record.temps.push(Float32Array.from(temp.subarray(0, nr)));
    record.conversions.push(Float32Array.from(alpha));
  };

  // The hottest point of a step: the hottest reacting node's temperature (a parabola through a sharp
  // front would overshoot), placed at the vertex of the parabola through it and its neighbours.
  const hottest = () => {
    let best = 0;
    for (let i = 1; i < nr; i++) if (temp[i]! > temp[best]!) best = i;
    if (best === 0 || best === nodes - 1) return { node: best, c: temp[best]!, depthM: z[best]! };
    const v = parabolaVertex(z[best - 1]!, temp[best - 1]!, z[best]!, temp[best]!, z[best + 1]!, temp[best + 1]!);
    return { node: best, c: temp[best]!, depthM: v.x };
  };

  let reactingTotal = 0;
  for (let i = 0; i < nr; i++) reactingTotal += grid.reactingVolume[i]!;
  const meanConversion = () => {
    let sum = 0;
    for (let i = 0; i < nr; i++) sum += alpha[i]! * grid.reactingVolume[i]!;
    return sum / reactingTotal;
  };

  let t = 0;
  let dt = Math.min(1, input.maxStepS);
  let steps = 0;
  let rejected = 0;
  const first = hottest();
  let peak = { c: first.c, timeS: 0, depthM: first.depthM, node: first.node };
  let conversionReachedS: number | null = null;
  let hitEnd = false;
  let runaway = false;
  let passedStopAbove = false;
  let warmestStart = -Infinity;
  for (let i = 0; i < nodes; i++) warmestStart = Math.max(warmestStart, temp[i]!);
  const ceilingC = Math.max(warmestStart, ambient.maxFromS(0)) + maxRise;
  keep(0);

  while (true) {
    if (t >= input.endS - 1e-9) {
      hitEnd = input.until === 'peak';
      break;
    }
    const step = Math.min(dt, input.endS - t);
    savedTemp.set(temp);
    savedAlpha.set(alpha);
    const h = input.surfaceH(temp[0]!, ambient.atS(t));
    const settled = coupledStep(system, temp, alpha, h, (f) => ambient.atS(t + f * step), step, scratch);

    let dT = 0;
    let dA = 0;
    for (let i = 0; i < nodes; i++) dT = Math.max(dT, Math.abs(temp[i]! - savedTemp[i]!));
    for (let i = 0; i < nr; i++) dA = Math.max(dA, alpha[i]! - savedAlpha[i]!);
    const load = Math.max(dT / input.stepKelvin, dA / input.stepConversion);
    if ((!settled || load > 2) && step > 1e-4) {
      temp.set(savedTemp);
      alpha.set(savedAlpha);
      dt = step / 2;
      rejected++;
      continue;
    }
    if (!settled) {
      // Even a tenth of a millisecond is too long for the reaction: only a runaway does that.
      runaway = true;
      break;
    }
    t += step;
    steps++;
    dt = Math.min(input.maxStepS, step * Math.min(2, Math.max(0.5, 0.9 / Math.max(load, 1e-12))));
    keep(t);

    const now = hottest();
    if (now.c > peak.c) {
      peak = { c: now.c, timeS: t, depthM: now.depthM, node: now.node };
      if (maxRise > 0 && peak.c >= ceilingC) {
        runaway = true;
        break;
      }
      if (input.stopAboveC !== undefined && peak.c > input.stopAboveC) {
        passedStopAbove = true;
        break;
      }
    }

    let minAlpha = 1;
    let maxAlpha = 0;
    for (let i = 0; i < nr; i++) {
      minAlpha = Math.min(minAlpha, alpha[i]!);
      maxAlpha = Math.max(maxAlpha, alpha[i]!);
    }
    if (input.stopAtConversion !== undefined && (input.stopConversionOf === 'mean' ? meanConversion() : maxAlpha) >= input.stopAtConversion) {
      conversionReachedS = t;
      break;
    }
    if (input.until === 'peak' && t > peak.timeS) {
      let maxAll = -Infinity;
      for (let i = 0; i < nodes; i++) maxAll = Math.max(maxAll, temp[i]!);
      const air = ambient.atS(t);
      const airAhead = ambient.maxFromS(t);
      // Nothing can heat beyond the hottest node plus what the least-cured resin can still release.
      const bounded = maxAll + maxRise * (1 - minAlpha) < peak.c && airAhead < peak.c;
      // Past gel everywhere, well past the peak, and cooled half-way back to the air: the reaction is spent.
      const spent = t >= 1.5 * peak.timeS && minAlpha >= law.kinetics.gelConversion && now.c <= air + 0.5 * (peak.c - air) && airAhead <= peak.c;
      if (bounded || spent) break;
    }
  }

  return {
    peakC: peak.c,
    peakTimeS: peak.timeS,
    peakDepthM: peak.depthM,
    peakNode: peak.node,
    endS: t,
    steps,
    rejectedSteps: rejected,
    hitEnd,
    conversionReachedS,
    runaway,
    passedStopAbove,
    finalTempC: temp,
    finalConversion: alpha,
    record,
  };
}
