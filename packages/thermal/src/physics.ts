/** Molar gas constant, J/(mol·K): exact since the 2019 SI redefinition (N_A × k). */
export const gasConstantJPerMolK = 8.314462618;

/** Stefan–Boltzmann constant, W/(m²·K⁴) (CODATA 2018, exact from h, c and k). */
export const stefanBoltzmannWPerM2K4 = 5.670374419e-8;

export const zeroCelsiusK = 273.15;

export const gravityMPerS2 = 9.80665;

export function kelvin(tempC: number): number {
  return tempC + zeroCelsiusK;
}
