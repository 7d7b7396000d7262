import { kelvin } from './physics';

/** A wood base under the resin, in the units a shop can look up. */
export interface WoodBase {
  name: string;
  conductivityWPerMK: number;
  densityGPerMl: number;
  heatCapacityJPerGK: number;
}

/**
 * Heat capacity of wood below fibre saturation, USDA Forest Products Laboratory, Wood Handbook
 * (2010), ch. 4 (Glass & Zelinka), eqs. 4-16 to 4-18: c0 = 0.1031 + 0.003867·T (dry wood,
 * kJ/(kg·K), T in K), c = (c0 + 4.18·x/100)/(1 + x/100) + Ac, Ac = x(b1 + b2·T + b3·x) with
 * b1 = −0.06191, b2 = 2.36e−4, b3 = −1.33e−4. kJ/(kg·K) and J/(g·K) are the same number.
 */
export function woodHeatCapacityJPerGK(moisturePct: number, tempC: number): number {
  const t = kelvin(tempC);
  const x = moisturePct;
  const dry = 0.1031 + 0.003867 * t;
  const bond = x * (-0.06191 + 2.36e-4 * t - 1.33e-4 * x);
  return (dry + (4.18 * x) / 100) / (1 + x / 100) + bond;
}

/**
 * Conductivity across the grain, Wood Handbook (2010) eq. 4-15, k = G·(B + C·x) + A with
 * A = 0.01864, B = 0.1941, C = 0.004064 (W/(m·K)); valid for G > 0.3, x < 25 %, near 24 °C.
 */
export function woodConductivityWPerMK(specificGravity: number, moisturePct: number): number {
  return specificGravity * (0.1941 + 0.004064 * moisturePct) + 0.01864;
}

/**
 * Sugar maple at 12 % moisture, a common hardwood for casting blanks: specific gravity 0.63 and
 * conductivity 0.18 W/(m·K) across the grain, as the Wood Handbook tabulates them (Table 4-7 and the
 * strength tables); density = G·(1 + x/100) g/mL; heat capacity from eqs. 4-16 to 4-18 at 20 °C.
 * Heat flows across the grain into the floor of a cavity cut in a face-grain blank.
 */
export const sugarMaple12Pct: WoodBase = {
  name: 'sugar maple, 12 % moisture',
  conductivityWPerMK: 0.18,
  densityGPerMl: 0.63 * 1.12,
  heatCapacityJPerGK: woodHeatCapacityJPerGK(12, 20),
};
