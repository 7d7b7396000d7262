import type { ResinSystemView } from '@gelpoint/contracts';
import { formatLength, formatMass, formatTemperature, type UnitSystem } from '@gelpoint/core';
import { mixRatioText, resinUseWords } from '../utils/shelf-words';
import { formatMoney } from '../../../lib/money';
import { DataSheet } from './DataSheet';

const exothermRows = [
  { field: 'reactionHeatJPerG', term: 'Heat of reaction', unit: 'J/g' },
  { field: 'thinFilmGelMin', term: 'Thin-film gel time', unit: 'min' },
  { field: 'heatCapacityJPerGK', term: 'Heat capacity', unit: 'J/(g·K)' },
  { field: 'conductivityWPerMK', term: 'Thermal conductivity', unit: 'W/(m·K)' },
  { field: 'acceptedPeakC', term: 'Accepted peak', unit: '°C' },
] as const;

export function ResinSystemSheet({ resinSystem: r, unitSystem, currency }: { resinSystem: ResinSystemView; unitSystem: UnitSystem; currency: string }) {
  const temp = (tempC: number) => formatTemperature(tempC, unitSystem).text;
  return (
    <DataSheet
      groups={[
        {
          title: 'Product',
          rows: [
            { term: 'Maker', value: r.maker || 'Not noted' },
            { term: 'Use', value: resinUseWords[r.use] },
            { term: 'Shelf life', value: `${r.shelfLifeMonths} months` },
          ],
        },
        {
          title: 'Mix',
          rows: [
            { term: 'Mix ratio', value: mixRatioText(r.mixRatio) },
            { term: 'Density of part A', value: `${r.densityAGPerMl} g/mL` },
            { term: 'Density of part B', value: `${r.densityBGPerMl} g/mL` },
          ],
        },
        {
          title: `Times at ${temp(r.referenceTempC)}`,
          rows: [
            { term: 'Pot life', value: `${r.potLifeMin} min` },
            { term: 'Gel time', value: `${r.gelTimeH} h` },
            { term: 'Tack-free', value: `${r.tackFreeH} h` },
            { term: 'Recoat window', value: `${r.recoatWindow.earliestH} h to ${r.recoatWindow.latestH} h` },
            { term: 'Demold', value: `${r.demoldH} h` },
            { term: 'Full cure', value: `${r.fullCureH} h` },
            { term: 'Ready to machine', value: r.readyToMachineH === null ? 'at full cure' : `${r.readyToMachineH} h` },
            { term: 'Cured hardness', value: r.hardnessShoreD === null ? 'not stated' : `Shore D ${r.hardnessShoreD}, checked before release` },
            {
              term: 'Activation energy used',
              value: `${r.effectiveActivationEnergyKJPerMol.toFixed(1)} kJ/mol${r.activationEnergyKJPerMol === null ? ' (common-practice default)' : ''}`,
            },
          ],
        },
        {
          title: 'Limits',
          rows: [
            { term: 'Maximum layer', value: formatLength(r.maxLayerMm, unitSystem).text },
            { term: 'Maximum batch', value: formatMass(r.maxBatchG, unitSystem).text },
            { term: 'Working temperature', value: `${temp(r.minWorkTempC)} to ${temp(r.maxWorkTempC)}` },
          ],
        },
        {
          title: 'Exotherm forecast',
          rows: exothermRows.map(({ field, term, unit }) => {
            const used = r.exothermSettings[field];
            const shown = field === 'acceptedPeakC' ? temp(used.value) : `${used.value.toFixed(field === 'conductivityWPerMK' ? 2 : 1)} ${unit}`;
            return { term, value: `${shown}${used.isDefault ? ` (default: ${used.source})` : ''}` };
          }),
        },
        {
          title: 'Price',
          rows: [{ term: 'Kit', value: `${formatMoney(r.pricePerKit, currency)} for ${formatMass(r.kitSizeG, unitSystem).text}` }],
        },
      ]}
    />
  );
}
