import { gasConstantJPerMolK, kelvin } from './physics';

/**
 * The cure law: the autocatalytic rate law of Kamal & Sourour (1973),
 *   dα/dt = (k1 + k2·α^m)·(1 − α)^n,
 * in the simplified form used for DGEBA/amine systems up to vitrification (Barral et al., J. Appl.
 * Polym. Sci. 56(9):1029–1037, 1995: both rate constants Arrhenius with Ea of 44–57 kJ/mol, m + n
 * of 2.5–3). Here both constants share one activation energy, so the law reads
 *   dα/dt = k2(T)·(ε + α^m)·(1 − α)^n,   ε = k1/k2,   k2(T) = k2(Tref)·exp(−(Ea/R)(1/T − 1/Tref)).
 * Diffusion control after vitrification is left out: it slows the tail of the cure, after the peak
 * this forecast is about, and leaving it out can only make the forecast hotter.
 */
export interface CureKinetics {
  /** Order of the autocatalytic term. */
  m: number;
  /** Order of the reactant term. */
  n: number;
  /** ε = k1/k2: how much the reaction starts on its own before its products catalyse it. */
  k1OverK2: number;
  /** Conversion at the gel point, where the data sheet's gel time is read. */
  gelConversion: number;
}

/**
 * m = 1, n = 2 gives m + n = 3, the top of Barral's 2.5–3 (the faster self-acceleration, so the
 * hotter forecast). ε = 0.02 is from memory of fitted DGEBA/amine values (k1 one to two orders of
 * magnitude below k2). The gel conversion is Flory's gel point for a diepoxide with a tetrafunctional
 * diamine at stoichiometry, α_gel = 1/√((f_A − 1)(f_B − 1)) = 1/√3 ≈ 0.577 (Flory, Principles of
 * Polymer Chemistry, ch. 9; the formula from memory).
 */
export const dgebaAmineKinetics: CureKinetics = { m: 1, n: 2, k1OverK2: 0.02, gelConversion: 1 / Math.sqrt(3) };

/** The shape of the law, (ε + α^m)(1 − α)^n, zero once the resin has fully reacted. */
export function autocatalyticShape(alpha: number, kin: CureKinetics): number {
  if (alpha >= 1) return 0;
  const a = alpha > 0 ? alpha : 0;
  const auto = kin.m === 1 ? a : Math.pow(a, kin.m);
  const left = 1 - a;
  const rest = kin.n === 2 ? left * left : Math.pow(left, kin.n);
  return (kin.k1OverK2 + auto) * rest;
}

const simpsonIntervals = 4096;

/**
 * ∫₀^α dα' / shape(α'): the isothermal time to conversion α in units of 1/k2 (composite Simpson;
 * the integrand is smooth and finite on [0, α] for α < 1 because ε > 0).
 */
export function reducedTimeTo(alpha: number, kin: CureKinetics): number {
  if (alpha <= 0) return 0;
  const h = alpha / simpsonIntervals;
  let sum = 1 / autocatalyticShape(0, kin) + 1 / autocatalyticShape(alpha, kin);
  for (let i = 1; i < simpsonIntervals; i++) sum += (i % 2 === 1 ? 4 : 2) / autocatalyticShape(i * h, kin);
  return (sum * h) / 3;
}

/** Conversion after a reduced time τ = k2·t held isothermal (classical RK4 on dα/dτ = shape(α)). */
export function conversionAfterReducedTime(tau: number, kin: CureKinetics): number {
  if (tau <= 0) return 0;
  const steps = 2000;
  const h = tau / steps;
  let a = 0;
  for (let i = 0; i < steps; i++) {
    const f1 = autocatalyticShape(a, kin);
    const f2 = autocatalyticShape(a + (h / 2) * f1, kin);
    const f3 = autocatalyticShape(a + (h / 2) * f2, kin);
    const f4 = autocatalyticShape(a + h * f3, kin);
    a = Math.min(1, a + (h / 6) * (f1 + 2 * f2 + 2 * f3 + f4));
  }
  return a;
}

/** A rate law pinned to the data sheet: k2 at the reference temperature from the thin-film gel time. */
export interface RateLaw {
  kinetics: CureKinetics;
  /** k2 at the reference temperature, 1/s. */
  k2RefPerS: number;
  refTempK: number;
  /** Ea/R, K. */
  activationTempK: number;
}

/**
 * A thin film stays at the shop's temperature, so its gel time is the isothermal time to α_gel:
 * t_gel = (1/k2)·∫₀^α_gel dα/shape(α), which fixes k2 at the reference temperature.
 */
export function rateLawFromGelTime(gelTimeMin: number, refTempC: number, activationEnergyKJPerMol: number, kin: CureKinetics): RateLaw {
  return {
    kinetics: kin,
    k2RefPerS: reducedTimeTo(kin.gelConversion, kin) / (gelTimeMin * 60),
    refTempK: kelvin(refTempC),
    activationTempK: (activationEnergyKJPerMol * 1000) / gasConstantJPerMolK,
  };
}

export function k2At(law: RateLaw, tempK: number): number {
  return law.k2RefPerS * Math.exp(-law.activationTempK * (1 / tempK - 1 / law.refTempK));
}

/** dα/dt in 1/s at conversion α and temperature T (kelvin). */
export function cureRate(law: RateLaw, alpha: number, tempK: number): number {
  return k2At(law, tempK) * autocatalyticShape(alpha, law.kinetics);
}

/** Isothermal time to a conversion at a temperature, s. */
export function isothermalTimeToS(law: RateLaw, alpha: number, tempC: number): number {
  return reducedTimeTo(alpha, law.kinetics) / k2At(law, kelvin(tempC));
}

/** ∂shape/∂α, for the Newton steps of the implicit solver. */
export function autocatalyticShapeSlope(alpha: number, kin: CureKinetics): number {
  if (alpha >= 1) return 0;
  const a = Math.max(alpha, 1e-12);
  const left = 1 - a;
  const auto = kin.m === 1 ? a : Math.pow(a, kin.m);
  const autoSlope = kin.m === 1 ? 1 : kin.m * Math.pow(a, kin.m - 1);
  const rest = kin.n === 2 ? left * left : Math.pow(left, kin.n);
  const restSlope = kin.n === 2 ? -2 * left : -kin.n * Math.pow(left, kin.n - 1);
  return autoSlope * rest + (kin.k1OverK2 + auto) * restSlope;
}
