import { rateFactor } from './arrhenius';
import { activationEnergyOf, type ResinSystem } from './shelf';

type PotLifeProduct = Pick<ResinSystem, 'potLifeMin' | 'referenceTempC' | 'activationEnergyKJPerMol'>;

/**
 * The working time of a mixed cup at a temperature: the data sheet's pot life (at its reference
 * temperature) scaled by the Arrhenius rate. The one pot life every screen and sheet shows.
 */
export function potLifeMinAt(product: PotLifeProduct, tempC: number): number {
  return product.potLifeMin / rateFactor(tempC, product.referenceTempC, activationEnergyOf(product));
}
