import type { MoldSummary, PigmentView, ResinSystemView } from '@gelpoint/contracts';
import { absorptionPresets, formatLength, type AbsorptionPreset, type UnitSystem } from '@gelpoint/core';
import type { z } from 'zod';
import type { ShapeKind } from './planner-values';

export interface PickerOption {
  value: string;
  label: string;
}

const useWords: Record<ResinSystemView['use'], string> = { seal: 'seal coat', deep_pour: 'deep pour', casting: 'casting', coating: 'flood coat' };

/**
 * What a picker offers: the products on the shelf, and an archived one only while a saved plan still names it, so
 * the maker sees why it must be replaced.
 */
export function productOptions(resinSystems: readonly ResinSystemView[], chosenId: string, unitSystem: UnitSystem): PickerOption[] {
  return resinSystems
    .filter((r) => !r.archived || r.id === chosenId)
    .map((r) => ({
      value: r.id,
      label: `${r.name} (${useWords[r.use]}, layers up to ${formatLength(r.maxLayerMm, unitSystem).text})${r.archived ? ' – archived, choose another' : ''}`,
    }));
}

export function pigmentOptions(pigments: readonly PigmentView[], chosenId: string): PickerOption[] {
  return pigments
    .filter((p) => !p.archived || p.id === chosenId)
    .map((p) => ({ value: p.id, label: `${p.name} (up to ${p.maxPct} %)${p.archived ? ' – archived, choose another' : ''}` }));
}

export const shapeOptions: readonly (PickerOption & { value: ShapeKind })[] = [
  { value: 'rectangle', label: 'Rectangular pocket, wood on all four sides' },
  { value: 'channel', label: 'River channel, dams at both ends' },
  { value: 'cylinder', label: 'Round pocket' },
  { value: 'area_depth', label: 'Irregular: outline area × average depth' },
];

const absorptionWords: Record<AbsorptionPreset, string> = {
  sealed: 'Sealed or non-porous',
  closed_grain: 'Closed-grain hardwood: maple, cherry, birch',
  open_grain: 'Open-pored hardwood: oak, ash, walnut',
  soft_or_spalted: 'Softwood, spalted or punky wood',
  end_grain: 'End grain',
};

export const absorptionOptions: readonly PickerOption[] = [
  ...(Object.keys(absorptionPresets) as AbsorptionPreset[]).map((preset) => ({ value: preset, label: `${absorptionWords[preset]} (× ${absorptionPresets[preset].toFixed(2)})` })),
  { value: 'custom', label: 'Our own factor, from test pieces' },
];

type Mold = z.infer<typeof MoldSummary>;

/** Only a mould whose cavity report is finished can be poured against. */
export function moldOptions(molds: readonly Mold[]): PickerOption[] {
  return molds.filter((m) => m.status === 'ready').map((m) => ({ value: m.id, label: m.name || m.fileName }));
}
