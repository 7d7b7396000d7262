import type { PigmentSort, ResinSystemSort } from '@gelpoint/contracts';
import type { CatalogueSortColumns } from './catalogue.service';

// The price columns show "price for kit size"; what compares across kit sizes is the price per gram.
export const resinSystemSortColumns: CatalogueSortColumns<ResinSystemSort> = {
  name: 'lower(p.name)',
  use: 'p.use',
  potLife: 'p.pot_life_min',
  maxLayer: 'p.max_layer_mm',
  maxBatch: 'p.max_batch_g',
  pricePerKg: 'p.price_per_kit / p.kit_size_g',
};

export const pigmentSortColumns: CatalogueSortColumns<PigmentSort> = {
  name: 'lower(p.name)',
  kind: 'p.kind',
  recommendedLoading: 'p.recommended_pct',
  maxLoading: 'p.max_pct',
  pricePerKg: 'p.price_per_pack / p.pack_size_g',
};
