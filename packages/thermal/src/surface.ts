import { gravityMPerS2, kelvin, stefanBoltzmannWPerM2K4 } from './physics';

/**
 * Air at 300 K, Incropera (Fundamentals of Heat and Mass Transfer) Table A.4, from memory:
 * conductivity 0.0263 W/(m·K), kinematic viscosity 15.89e−6 m²/s, diffusivity 22.5e−6 m²/s, Pr 0.707.
 * One film temperature is enough: h moves with the fourth or third root of these.
 */
const air = { conductivityWPerMK: 0.0263, viscosityM2PerS: 15.89e-6, diffusivityM2PerS: 22.5e-6, prandtl: 0.707 };

/** Emissivity of a resin surface, about 0.9 like most polymers (from memory). */
export const resinEmissivity = 0.9;

function rayleighPerLength3(surfaceC: number, airC: number): number {
  const beta = 1 / kelvin((surfaceC + airC) / 2);
  return (gravityMPerS2 * beta * Math.abs(surfaceC - airC)) / (air.viscosityM2PerS * air.diffusivityM2PerS);
}

/**
 * Natural convection from the upper surface of a hot horizontal plate, Incropera's correlations
 * (ch. 9): Nu_L = 0.54·Ra_L^¼ up to Ra_L = 10⁷ and 0.15·Ra_L^⅓ above, with L = area/perimeter.
 * Without a size the ⅓ form is used for every plate: L cancels out of it, and it gives the lower of
 * the two coefficients for the smaller plates of the laminar range, so an unknown size errs hot.
 * A surface colder than the air gets the coefficient of one as much warmer (the true one, the
 * lower-surface correlation, is smaller): a cold mix then warms faster than in the shop, erring hot.
 */
export function upwardPlateConvectionWPerM2K(surfaceC: number, airC: number, lengthM?: number): number {
  const raPerL3 = rayleighPerLength3(surfaceC, airC);
  if (raPerL3 === 0) return 0;
  if (lengthM === undefined) return 0.15 * air.conductivityWPerMK * Math.cbrt(raPerL3);
  const ra = raPerL3 * lengthM ** 3;
  const nu = ra <= 1e7 ? 0.54 * Math.pow(ra, 0.25) : 0.15 * Math.cbrt(ra);
  return (nu * air.conductivityWPerMK) / lengthM;
}

/**
 * Free convection around a sphere, Churchill's correlation as Incropera gives it (eq. 9.35, from
 * memory): Nu_D = 2 + 0.589·Ra_D^¼ / [1 + (0.469/Pr)^(9/16)]^(4/9), for Ra_D ≤ 10¹¹ and Pr ≥ 0.7.
 */
export function sphereConvectionWPerM2K(surfaceC: number, airC: number, diameterM: number): number {
  const ra = rayleighPerLength3(surfaceC, airC) * diameterM ** 3;
  const nu = 2 + (0.589 * Math.pow(ra, 0.25)) / Math.pow(1 + Math.pow(0.469 / air.prandtl, 9 / 16), 4 / 9);
  return (nu * air.conductivityWPerMK) / diameterM;
}

/**
 * Radiation to surroundings at the air's temperature, linearised as Incropera's radiation
 * coefficient (eq. 1.9): h_r = εσ(Ts + Tsur)(Ts² + Tsur²), so q = h_r·(Ts − Tsur) exactly.
 */
export function radiationWPerM2K(surfaceC: number, airC: number, emissivity = resinEmissivity): number {
  const ts = kelvin(surfaceC);
  const ta = kelvin(airC);
  return emissivity * stefanBoltzmannWPerM2K4 * (ts + ta) * (ts * ts + ta * ta);
}
