import type { LotView } from '@gelpoint/contracts';
import { formatMass, type UnitSystem } from '@gelpoint/core';

export interface LotOption {
  value: string;
  label: string;
}

/**
 * The lots a cup can be mixed from: every lot with stock left, in-date lots first. Expired lots stay pickable and
 * say so, because the API asks the person mixing to confirm them rather than forbidding them.
 */
export function lotOptions(lots: readonly LotView[], unitSystem: UnitSystem): LotOption[] {
  return lots
    .filter((lot) => lot.remainingG > 0)
    .map((lot, i) => ({ lot, i }))
    .sort((p, q) => Number(p.lot.expired) - Number(q.lot.expired) || p.i - q.i)
    .map(({ lot }) => ({
      value: lot.id,
      label: [
        lot.lotNumber,
        `${formatMass(lot.remainingG, unitSystem).text} left`,
        lot.expired ? `PAST ITS DATE (${lot.expiresOn ?? 'expired'})` : lot.expiresOn ? `use by ${lot.expiresOn}` : null,
      ]
        .filter(Boolean)
        .join(' · '),
    }));
}
