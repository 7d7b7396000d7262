/** Molar gas constant, J/(mol·K): exact since the 2019 SI redefinition (N_A × k). */
export declare const gasConstantJPerMolK = 8.314462618;
export declare function celsiusToKelvin(tempC: number): number;
/** Q = Ea/R in kelvin, the form the maturity method writes its exponent in. */
export declare function kelvinQFromActivationEnergy(activationEnergyKJPerMol: number): number;
export declare function activationEnergyFromKelvinQ(qK: number): number;
/**
 * The activation energy at which the rate doubles from refTempC to refTempC + 10 K, for products
 * whose data sheet gives none: Ea = R·ln2 / (1/T1 − 1/T2).
 */
export declare function activationEnergyForDoublingPer10K(refTempC: number): number;
/** k(T)/k(Tref) = exp(−(Ea/R)(1/T − 1/Tref)), temperatures in °C at the boundary, kelvin inside. */
export declare function rateFactor(tempC: number, refTempC: number, activationEnergyKJPerMol: number): number;
/** A data-sheet time at the reference temperature, stretched or shortened for another temperature. */
export declare function hoursAtTemperature(hoursAtRef: number, tempC: number, refTempC: number, activationEnergyKJPerMol: number): number;
