import type { CureStageKey } from '@gelpoint/core';
import type { CureCheckStageKey, PourStatusKey } from '../types';

/** What the cure model's milestones are called on the board: reached (past) and ahead (future). */
const stageWordsByKey: Record<CureStageKey, { reached: string; ahead: string }> = {
  gel: { reached: 'Gelled', ahead: 'Gel' },
  next_layer_opens: { reached: 'Next layer can go on', ahead: 'Next-layer window opens' },
  tack_free: { reached: 'Tack-free', ahead: 'Tack-free' },
  next_layer_closes: { reached: 'Next-layer window closed', ahead: 'Next-layer window closes' },
  demold: { reached: 'Ready to demold', ahead: 'Demold' },
  full_cure: { reached: 'Fully cured', ahead: 'Full cure' },
  ready_to_machine: { reached: 'Ready to machine', ahead: 'Ready to machine' },
};

export const cureStageKeys = Object.keys(stageWordsByKey) as CureStageKey[];

function isStageKey(key: string): key is CureStageKey {
  return key in stageWordsByKey;
}

/** The stage a pour has reached, in words; before gel the resin is still liquid. */
export function stageReachedWords(key: string | null): string {
  if (key === null) return 'Liquid, not yet gelled';
  return isStageKey(key) ? stageWordsByKey[key].reached : key.replaceAll('_', ' ');
}

export function stageAheadWords(key: string): string {
  return isStageKey(key) ? stageWordsByKey[key].ahead : key.replaceAll('_', ' ');
}

export const checkStageWords: Record<CureCheckStageKey, string> = {
  liquid: 'Still liquid',
  gelled: 'Gelled',
  tack_free: 'Tack-free',
  demoldable: 'Can be demolded',
  machinable: 'Hard enough to machine',
};

export const pourStatusWords: Record<PourStatusKey, string> = {
  open: 'Curing',
  released: 'Released for machining',
  machined: 'Machined',
  cancelled: 'Cancelled',
};

export const nextLayerWindowWords: Record<'not_open' | 'open' | 'closed', string> = {
  not_open: 'Next-layer window not open yet',
  open: 'Next-layer window open: pour the next layer now',
  closed: 'Next-layer window closed: sand before the next layer',
};

export { stepWords } from '../../../lib/step-words';
