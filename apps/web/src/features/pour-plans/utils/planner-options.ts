import type { MoldSummary, MoldView, PigmentView, ResinSystemView } from '@gelpoint/contracts';
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
  ...(Object.keys(absorptionPresets) as AbsorptionPreset[]).map((preset) => ({
    value: preset,
    label: `${absorptionWords[preset]} (× ${absorptionPresets[preset].toFixed(2)})`,
  })),
  { value: 'custom', label: 'Our own factor, from test pieces' },
];

type Mold = z.infer<typeof MoldSummary>;

/** Only a mould whose cavity report is finished can be poured against. */
export function moldOptions(molds: readonly Mold[]): PickerOption[] {
  return molds.filter((m) => m.status === 'ready').map((m) => ({ value: m.id, label: m.name || m.fileName }));
}

/** What the planner knows of the mould a plan names: still loading, found, or gone from the shop. */
export type ChosenMold = { state: 'loading' } | { state: 'found'; mold: Pick<MoldView, 'id' | 'name' | 'fileName' | 'status' | 'pieceId'> } | { state: 'gone' };

export const goneMoldWords = 'The mould this plan was made with is no longer in the shop; choose another mould or plan with a quick shape.';

/**
 * The piece's measured moulds, and the one the plan names even when it is not among them (moved to another piece,
 * being measured again, or gone), so the picker always shows what the plan holds rather than an empty choice.
 */
export function moldChoices(molds: readonly Mold[], chosenId: string, chosen: ChosenMold, pieceId: string): PickerOption[] {
  const options = moldOptions(molds);
  if (!chosenId || options.some((o) => o.value === chosenId)) return options;
  const label = (() => {
    if (chosen.state === 'gone') return 'No longer in the shop – choose another';
    if (chosen.state === 'loading') return 'The plan’s mould';
    const m = chosen.mold;
    const notes = [m.status === 'ready' ? null : 'being measured', m.pieceId === pieceId ? null : 'of another piece'].filter(Boolean);
    return `${m.name || m.fileName}${notes.length > 0 ? ` (${notes.join(', ')})` : ''}`;
  })();
  return [...options, { value: chosenId, label }];
}
