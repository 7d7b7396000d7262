import { checkRatio, parseRatioParts, type RatioBasis } from './mix-ratio';
import { fail, ok, type Result } from './result';

/**
 * What to mix toward. A volume target is the whole cup's volume, pigment included (the pigment takes
 * room in the mould too). A mass target is the resin alone (part A + part B); pigment goes on top of
 * it, because a pigment's loading is stated as a percentage of part A + part B by mass.
 */
export type MixTarget = { volumeMl: number } | { massG: number };

export interface MixInput {
  target: MixTarget;
  ratio: string | { a: number; b: number };
  basis: RatioBasis;
  densityAGPerMl: number;
  densityBGPerMl: number;
  /** Pigment as a percentage of part A + part B by mass. */
  pigmentPct?: number;
  /**
   * The pigment's density, to count its volume in a volume target. Absent: the pigment is taken to
   * be as dense as the mixed resin, so it adds its own share of volume.
   */
  pigmentDensityGPerMl?: number;
  /** The pigment's maximum loading; above it the mix is refused. */
  pigmentMaxPct?: number;
}

export interface MixPart {
  grams: number;
  ml: number;
}

export interface MixResult {
  partA: MixPart;
  partB: MixPart;
  pigment: { grams: number };
  /** A + B + pigment. */
  totalGrams: number;
  /** A+B mass over A+B volume (volumes add; pigment left out). */
  mixedDensityGPerMl: number;
  /** The pigment's own volume (mass over its density), part of a volume target. */
  pigmentMl: number;
}

function checkDensity(value: number, part: 'A' | 'B'): Result<number> {
  if (!Number.isFinite(value) || value <= 0) {
    return fail(
      'density_not_positive',
      `The density of part ${part} must be above zero (in g/mL), got ${String(value)}; take it from the data sheet, typically about 0.9 to 1.2.`,
    );
  }
  return ok(value);
}

export function checkPigmentPct(pigmentPct: number, pigmentMaxPct?: number): Result<number> {
  if (!Number.isFinite(pigmentPct) || pigmentPct < 0 || pigmentPct > 100) {
    return fail(
      'pigment_pct_out_of_range',
      `Pigment must be between 0 and 100 % of part A + part B by mass, got ${String(pigmentPct)}; enter a percentage such as 2.`,
    );
  }
  if (pigmentMaxPct !== undefined && pigmentPct > pigmentMaxPct) {
    return fail(
      'pigment_over_max',
      `Pigment at ${pigmentPct} % is over this pigment's maximum of ${pigmentMaxPct} % of part A + part B by mass; lower it to ${pigmentMaxPct} % or less so the resin still cures.`,
    );
  }
  return ok(pigmentPct);
}

/** Grams and millilitres of A, B and pigment for one target; densities convert, volumes add. */
export function mixBatch(input: MixInput): Result<MixResult> {
  const ratio = typeof input.ratio === 'string' ? parseRatioParts(input.ratio) : checkRatio(input.ratio);
  if (!ratio.ok) return ratio;
  const densityA = checkDensity(input.densityAGPerMl, 'A');
  if (!densityA.ok) return densityA;
  const densityB = checkDensity(input.densityBGPerMl, 'B');
  if (!densityB.ok) return densityB;
  const pigmentPct = checkPigmentPct(input.pigmentPct ?? 0, input.pigmentMaxPct);
  if (!pigmentPct.ok) return pigmentPct;
  if (input.basis !== 'weight' && input.basis !== 'volume') {
    return fail('basis_unknown', `The mix ratio basis must be "weight" or "volume", got "${String(input.basis)}".`);
  }

  const { a, b } = ratio.value;
  const rhoA = densityA.value;
  const rhoB = densityB.value;
  const share = pigmentPct.value / 100;
  if (input.pigmentDensityGPerMl !== undefined && !(Number.isFinite(input.pigmentDensityGPerMl) && input.pigmentDensityGPerMl > 0)) {
    return fail(
      'density_not_positive',
      `The pigment's density must be above zero (in g/mL), got ${String(input.pigmentDensityGPerMl)}; liquid colourants are near 1, mica powders near 2.8.`,
    );
  }
  const rhoAB = mixedDensity({ a, b, basis: input.basis }, rhoA, rhoB);
  const rhoPigment = input.pigmentDensityGPerMl ?? rhoAB;
  let gramsA: number;
  let gramsB: number;
  if ('volumeMl' in input.target) {
    const volumeMl = input.target.volumeMl;
    if (!Number.isFinite(volumeMl) || volumeMl <= 0) {
      return fail('volume_not_positive', `The volume to mix must be above zero (in mL), got ${String(volumeMl)}; enter how much resin you need.`);
    }
    // volume = mA/ρA + mB/ρB + share·(mA + mB)/ρpigment, solved for one part's worth of the ratio.
    if (input.basis === 'volume') {
      const mlPerPart = volumeMl / (a + b + (share * (a * rhoA + b * rhoB)) / rhoPigment);
      gramsA = a * mlPerPart * rhoA;
      gramsB = b * mlPerPart * rhoB;
    } else {
      const gramsPerPart = volumeMl / (a / rhoA + b / rhoB + (share * (a + b)) / rhoPigment);
      gramsA = a * gramsPerPart;
      gramsB = b * gramsPerPart;
    }
  } else {
    const massG = input.target.massG;
    if (!Number.isFinite(massG) || massG <= 0) {
      return fail('mass_not_positive', `The mass to mix must be above zero (in g), got ${String(massG)}; enter how much resin you need.`);
    }
    if (input.basis === 'weight') {
      gramsA = (massG * a) / (a + b);
      gramsB = (massG * b) / (a + b);
    } else {
      const mlPerPart = massG / (a * rhoA + b * rhoB);
      gramsA = a * mlPerPart * rhoA;
      gramsB = b * mlPerPart * rhoB;
    }
  }
  const mlA = gramsA / rhoA;
  const mlB = gramsB / rhoB;
  const pigmentGrams = share * (gramsA + gramsB);
  return ok({
    partA: { grams: gramsA, ml: mlA },
    partB: { grams: gramsB, ml: mlB },
    pigment: { grams: pigmentGrams },
    totalGrams: gramsA + gramsB + pigmentGrams,
    mixedDensityGPerMl: (gramsA + gramsB) / (mlA + mlB),
    pigmentMl: pigmentGrams / rhoPigment,
  });
}

/** Mixed density of A+B for a ratio, without a target: what converts a cavity's mL into grams. */
export function mixedDensity(ratio: { a: number; b: number; basis: RatioBasis }, densityAGPerMl: number, densityBGPerMl: number): number {
  if (ratio.basis === 'weight') {
    return (ratio.a + ratio.b) / (ratio.a / densityAGPerMl + ratio.b / densityBGPerMl);
  }
  return (ratio.a * densityAGPerMl + ratio.b * densityBGPerMl) / (ratio.a + ratio.b);
}

/** Part A over part B by mass: the ratio a scale checks, whatever basis the data sheet states. */
export function massRatioAToB(ratio: { a: number; b: number; basis: RatioBasis }, densityAGPerMl: number, densityBGPerMl: number): number {
  return ratio.basis === 'weight' ? ratio.a / ratio.b : (ratio.a * densityAGPerMl) / (ratio.b * densityBGPerMl);
}

/**
 * The resin (A+B) mass that, with its pigment, fills a volume: V = m/ρ(A+B) + share·m/ρ(pigment).
 * Without a pigment density the pigment is taken to be as dense as the resin.
 */
export function resinMassForVolume(volumeMl: number, mixedDensityGPerMl: number, pigmentPct: number, pigmentDensityGPerMl?: number): number {
  const share = pigmentPct / 100;
  return volumeMl / (1 / mixedDensityGPerMl + share / (pigmentDensityGPerMl ?? mixedDensityGPerMl));
}
