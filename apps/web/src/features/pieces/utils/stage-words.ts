import type { PieceStage } from '@gelpoint/contracts';

export interface StageWords {
  label: string;
  meaning: string;
}

export const stageWords: Record<PieceStage, StageWords> = {
  planning: { label: 'Planning', meaning: 'mould, fill level and pour plan still being worked out' },
  pouring: { label: 'Pouring', meaning: 'seal coat or layers going into the mould' },
  curing: { label: 'Curing', meaning: 'resin in the mould, waiting on the cure' },
  ready: { label: 'Ready for release', meaning: 'the cure log says it has set; waiting for the shop lead to release it' },
  released: { label: 'Released for machining', meaning: 'out of the mould and cleared to be faced and machined' },
  finishing: { label: 'Finishing', meaning: 'being machined, sanded and given its finish coats' },
  done: { label: 'Done', meaning: 'finished and off the bench' },
};
