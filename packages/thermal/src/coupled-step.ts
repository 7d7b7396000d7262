import type { ColumnGrid } from './column-grid';
import { autocatalyticShape, autocatalyticShapeSlope, k2At, type RateLaw } from './kinetics';
import { zeroCelsiusK } from './physics';

/**
 * One time step of the coupled column: conduction C·dT/dt = −K·T + b + H·dα/dt and cure
 * dα/dt = r(α, T), where H is the reaction heat each node's resin releases per unit conversion.
 * The step is TR-BDF2 (a trapezoidal stage to t + γΔt, then BDF2 to t + Δt, γ = 2 − √2; Bank et
 * al. 1985, from memory): second-order like Crank–Nicolson, but L-stable, so large steps while the
 * resin cures slowly do not ring at the surface or at the resin/wood boundary. Both stages are
 * implicit in temperature and conversion together and solved by Newton's method: conversion is
 * eliminated node by node (a scalar Newton with bisection as a safeguard), which leaves a
 * tridiagonal system in temperature. The heat term is written as H·(α_new − α_old), so every
 * joule of reaction heat is accounted for exactly, however fast the runaway.
 */

const gamma = 2 - Math.SQRT2;
const bdfOwn = (1 - gamma) / (2 - gamma);
const bdfStar = 1 / (gamma * (2 - gamma));
const bdfOld = (1 - gamma) ** 2 / (gamma * (2 - gamma));

export interface CoupledSystem {
  grid: ColumnGrid;
  law: RateLaw;
  /** J per unit conversion released in each reacting node. */
  heat: Float64Array;
}

export interface StepScratch {
  rhsT: Float64Array;
  rhsA: Float64Array;
  starT: Float64Array;
  starA: Float64Array;
  nextT: Float64Array;
  nextA: Float64Array;
  slope: Float64Array;
  delta: Float64Array;
  c: Float64Array;
  d: Float64Array;
}

export function stepScratch(nodes: number, reacting: number): StepScratch {
  const n = () => new Float64Array(nodes);
  const r = () => new Float64Array(reacting);
  return { rhsT: n(), rhsA: r(), starT: n(), starA: r(), nextT: n(), nextA: r(), slope: r(), delta: n(), c: n(), d: n() };
}

function rate(law: RateLaw, alpha: number, tempC: number): number {
  return k2At(law, tempC + zeroCelsiusK) * autocatalyticShape(alpha, law.kinetics);
}

/**
 * α − θ·r(α, T) = target for one node at a fixed temperature: the smallest root in [target, 1].
 * Returns NaN when the step is so long that the root is no longer simple (the caller shortens it).
 */
function localConversion(law: RateLaw, tempC: number, theta: number, target: number, guess: number): { alpha: number; dAlphaDT: number } {
  if (target >= 1) return { alpha: 1, dAlphaDT: 0 };
  const tk = tempC + zeroCelsiusK;
  const k = k2At(law, tk);
  const kin = law.kinetics;
  let lo = target;
  let hi = 1;
  let a = Math.min(hi, Math.max(lo, guess));
  for (let it = 0; it < 60; it++) {
    const g = a - theta * k * autocatalyticShape(a, kin) - target;
    if (g > 0) hi = a;
    else lo = a;
    const slope = 1 - theta * k * autocatalyticShapeSlope(a, kin);
    const newton = a - g / slope;
    if (slope > 0 && Math.abs(newton - a) <= 1e-14) {
      a = Math.min(1, Math.max(target, newton));
      break;
    }
    a = slope > 0 && newton > lo && newton < hi ? newton : (lo + hi) / 2;
    if (hi - lo < 1e-14) break;
  }
  const slope = 1 - theta * k * autocatalyticShapeSlope(a, kin);
  if (!(slope > 1e-9)) return { alpha: NaN, dAlphaDT: NaN };
  const rT = (k * autocatalyticShape(a, kin) * law.activationTempK) / (tk * tk);
  return { alpha: a, dAlphaDT: (theta * rT) / slope };
}

/**
 * Solves C·T + θ·(K·T − b) − H·α = rhsT with α − θ·r(α, T) = rhsA, starting from T and α as given
 * (both overwritten). False when Newton does not settle: the caller halves the step.
 */
function solveStage(sys: CoupledSystem, theta: number, hA: number, airC: number, temp: Float64Array, alpha: Float64Array, s: StepScratch): boolean {
  const { grid, law, heat } = sys;
  const n = temp.length;
  const nr = alpha.length;
  const g = grid.conductance;
  const cap = grid.capacity;
  for (let iter = 0; iter < 25; iter++) {
    for (let i = 0; i < nr; i++) {
      const local = localConversion(law, temp[i]!, theta, s.rhsA[i]!, alpha[i]!);
      if (Number.isNaN(local.alpha)) return false;
      alpha[i] = local.alpha;
      s.slope[i] = local.dAlphaDT;
    }
    let prevC = 0;
    let prevD = 0;
    for (let i = 0; i < n; i++) {
      const up = i > 0 ? g[i - 1]! : 0;
      const down = i < n - 1 ? g[i]! : 0;
      let flow = 0;
      if (i > 0) flow += up * (temp[i]! - temp[i - 1]!);
      if (i < n - 1) flow += down * (temp[i]! - temp[i + 1]!);
      if (i === 0) flow += hA * (temp[0]! - airC);
      const released = i < nr ? heat[i]! * alpha[i]! : 0;
      const resid = cap[i]! * temp[i]! + theta * flow - released - s.rhsT[i]!;
      const diag = cap[i]! + theta * (up + down + (i === 0 ? hA : 0)) - (i < nr ? heat[i]! * s.slope[i]! : 0);
      const lower = -theta * up;
      const upper = -theta * down;
      const denom = diag - lower * prevC;
      if (!(denom > 0)) return false;
      prevC = upper / denom;
      prevD = (-resid - lower * prevD) / denom;
      s.c[i] = prevC;
      s.d[i] = prevD;
    }
    let worst = 0;
    let next = s.d[n - 1]!;
    s.delta[n - 1] = next;
    for (let i = n - 2; i >= 0; i--) {
      next = s.d[i]! - s.c[i]! * next;
      s.delta[i] = next;
    }
    for (let i = 0; i < n; i++) {
      temp[i] = temp[i]! + s.delta[i]!;
      worst = Math.max(worst, Math.abs(s.delta[i]!));
    }
    if (!Number.isFinite(worst)) return false;
    if (worst < 1e-4) {
      for (let i = 0; i < nr; i++) {
        const local = localConversion(law, temp[i]!, theta, s.rhsA[i]!, alpha[i]!);
        if (Number.isNaN(local.alpha)) return false;
        alpha[i] = local.alpha;
      }
      return true;
    }
  }
  return false;
}

/** K·T − b at node i (heat leaving the node by conduction and through the surface). */
function outflow(grid: ColumnGrid, temp: Float64Array, hA: number, airC: number, i: number): number {
  const g = grid.conductance;
  const n = temp.length;
  let flow = 0;
  if (i > 0) flow += g[i - 1]! * (temp[i]! - temp[i - 1]!);
  if (i < n - 1) flow += g[i]! * (temp[i]! - temp[i + 1]!);
  if (i === 0) flow += hA * (temp[0]! - airC);
  return flow;
}

/**
 * Advances temperature (°C) and conversion in place by dtS; false (state untouched) when a stage
 * would not converge. The surface coefficient is held over the step; the air is read at each
 * stage's end.
 */
export function coupledStep(
  sys: CoupledSystem,
  temp: Float64Array,
  alpha: Float64Array,
  surfaceHWPerM2K: number,
  airAt: (fraction: number) => number,
  dtS: number,
  s: StepScratch,
): boolean {
  const { grid, law, heat } = sys;
  const n = temp.length;
  const nr = alpha.length;
  const cap = grid.capacity;
  const hA = surfaceHWPerM2K * grid.surfaceArea;
  const theta1 = (gamma * dtS) / 2;
  const air0 = airAt(0);
  for (let i = 0; i < n; i++) {
    s.rhsT[i] = cap[i]! * temp[i]! - theta1 * outflow(grid, temp, hA, air0, i) - (i < nr ? heat[i]! * alpha[i]! : 0);
  }
  for (let i = 0; i < nr; i++) s.rhsA[i] = Math.min(1, alpha[i]! + theta1 * rate(law, alpha[i]!, temp[i]!));
  s.starT.set(temp);
  s.starA.set(alpha);
  if (!solveStage(sys, theta1, hA, airAt(gamma), s.starT, s.starA, s)) return false;

  for (let i = 0; i < n; i++) {
    s.rhsT[i] = cap[i]! * (bdfStar * s.starT[i]! - bdfOld * temp[i]!) - (i < nr ? heat[i]! * (bdfStar * s.starA[i]! - bdfOld * alpha[i]!) : 0);
  }
  for (let i = 0; i < nr; i++) s.rhsA[i] = Math.min(1, bdfStar * s.starA[i]! - bdfOld * alpha[i]!);
  s.nextT.set(s.starT);
  s.nextA.set(s.starA);
  if (!solveStage(sys, bdfOwn * dtS, hA, airAt(1), s.nextT, s.nextA, s)) return false;
  temp.set(s.nextT);
  alpha.set(s.nextA);
  return true;
}
