import type { PigmentView } from '@gelpoint/contracts';
import { formatMass, type UnitSystem } from '@gelpoint/core';
import { pigmentKindWords } from '../utils/shelf-words';
import { formatMoney } from '../../../lib/money';
import { DataSheet } from './DataSheet';

export function PigmentSheet({ pigment: p, unitSystem, currency }: { pigment: PigmentView; unitSystem: UnitSystem; currency: string }) {
  return (
    <DataSheet
      groups={[
        {
          title: 'Loading',
          rows: [
            { term: 'Kind', value: pigmentKindWords[p.kind] },
            { term: 'Density', value: `${p.densityGPerMl} g/mL` },
            { term: 'Recommended', value: `${p.recommendedPct} % of part A + part B by mass` },
            { term: 'Maximum', value: `${p.maxPct} % of part A + part B by mass` },
          ],
        },
        { title: 'Price', rows: [{ term: 'Pack', value: `${formatMoney(p.pricePerPack, currency)} for ${formatMass(p.packSizeG, unitSystem).text}` }] },
      ]}
    />
  );
}
