import { type ResinSystem } from './shelf';
type PotLifeProduct = Pick<ResinSystem, 'potLifeMin' | 'referenceTempC' | 'activationEnergyKJPerMol'>;
/**
 * The working time of a mixed cup at a temperature: the data sheet's pot life (at its reference
 * temperature) scaled by the Arrhenius rate. The one pot life every screen and sheet shows.
 */
export declare function potLifeMinAt(product: PotLifeProduct, tempC: number): number;
export {};
