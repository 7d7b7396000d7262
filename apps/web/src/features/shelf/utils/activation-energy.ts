import { activationEnergyOf } from '@gelpoint/core';

export interface ActivationEnergyUsed {
  valueKJPerMol: number;
  fromDataSheet: boolean;
}

/**
 * The value the cure model will use for what is typed now: the data sheet's, or core's common-practice default
 * (the rate doubles per 10 °C at the reference temperature). Null while the reference temperature is not a number.
 */
export function activationEnergyUsed(typedKJPerMol: number | null, referenceTempC: number): ActivationEnergyUsed | null {
  if (!Number.isFinite(referenceTempC)) return null;
  const fromDataSheet = typedKJPerMol !== null && Number.isFinite(typedKJPerMol) && typedKJPerMol > 0;
  return {
    valueKJPerMol: activationEnergyOf(fromDataSheet ? { activationEnergyKJPerMol: typedKJPerMol, referenceTempC } : { referenceTempC }),
    fromDataSheet,
  };
}
