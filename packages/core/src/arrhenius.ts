/** Molar gas constant, J/(mol·K): exact since the 2019 SI redefinition (N_A × k). */
export const gasConstantJPerMolK = 8.314462618;

const zeroCelsiusK = 273.15;

export function celsiusToKelvin(tempC: number): number {
  return tempC + zeroCelsiusK;
}

/** Q = Ea/R in kelvin, the form the maturity method writes its exponent in. */
export function kelvinQFromActivationEnergy(activationEnergyKJPerMol: number): number {
  return (activationEnergyKJPerMol * 1000) / gasConstantJPerMolK;
}

export function activationEnergyFromKelvinQ(qK: number): number {
  return (qK * gasConstantJPerMolK) / 1000;
}

/**
 * The activation energy at which the rate doubles from refTempC to refTempC + 10 K, for products
 * whose data sheet gives none: Ea = R·ln2 / (1/T1 − 1/T2).
 */
export function activationEnergyForDoublingPer10K(refTempC: number): number {
  const t1 = celsiusToKelvin(refTempC);
  const t2 = t1 + 10;
  return (gasConstantJPerMolK * Math.LN2) / (1 / t1 - 1 / t2) / 1000;
}

/** k(T)/k(Tref) = exp(−(Ea/R)(1/T − 1/Tref)), temperatures in °C at the boundary, kelvin inside. */
export function rateFactor(tempC: number, refTempC: number, activationEnergyKJPerMol: number): number {
  const q = kelvinQFromActivationEnergy(activationEnergyKJPerMol);
  return Math.exp(-q * (1 / celsiusToKelvin(tempC) - 1 / celsiusToKelvin(refTempC)));
}

/** A data-sheet time at the reference temperature, stretched or shortened for another temperature. */
export function hoursAtTemperature(hoursAtRef: number, tempC: number, refTempC: number, activationEnergyKJPerMol: number): number {
  return hoursAtRef / rateFactor(tempC, refTempC, activationEnergyKJPerMol);
}
