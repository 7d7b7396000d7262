import type { LotView, PigmentInput, PigmentView, ResinSystemInput, ResinSystemView } from '@gelpoint/contracts';
import type { DefaultValues } from 'react-hook-form';

/** A saved entry as the form edits it: the view without what only the API adds (id, archive state, derived values). */
export function resinSystemInputOf(view: ResinSystemView): ResinSystemInput {
  const { id: _id, effectiveActivationEnergyKJPerMol: _used, exothermSettings: _settings, archived: _archived, updatedAt: _updated, ...input } = view;
  return input;
}

export function pigmentInputOf(view: PigmentView): PigmentInput {
  const { id: _id, archived: _archived, updatedAt: _updated, ...input } = view;
  return input;
}

/** A new data sheet starts empty: nothing is guessed for the lead, so every number is read off the TDS. */
export const newResinSystemDefaults: DefaultValues<ResinSystemInput> = {
  name: '',
  maker: '',
  use: 'deep_pour',
  mixRatio: { basis: 'weight' },
  readyToMachineH: null,
  activationEnergyKJPerMol: null,
  hardnessShoreD: null,
  reactionHeatJPerG: null,
  thinFilmGelMin: null,
  heatCapacityJPerGK: null,
  conductivityWPerMK: null,
  acceptedPeakC: null,
};

export const newPigmentDefaults: DefaultValues<PigmentInput> = { name: '', kind: 'paste' };

export interface LotEditValues {
  lotNumber: string;
  remainingG: number;
  expiresOn: string | null;
  notes: string;
}

export function lotEditValuesOf(lot: LotView): LotEditValues {
  return { lotNumber: lot.lotNumber, remainingG: lot.remainingG, expiresOn: lot.expiresOn, notes: lot.notes };
}
