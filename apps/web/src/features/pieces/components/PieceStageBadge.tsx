import type { PieceStage } from '@gelpoint/contracts';
import { cx } from '../../../lib/cx';
import { stageWords } from '../utils/stage-words';
import { StageIcon } from './StageIcon';

const tint: Record<PieceStage, string> = {
  planning: 'border-walnut-300 bg-paper text-walnut-800',
  pouring: 'border-resin-400 bg-resin-50 text-resin-700',
  curing: 'border-resin-500 bg-resin-100 text-resin-700',
  ready: 'border-moss-600 bg-moss-50 text-moss-700',
  released: 'border-moss-600 bg-white text-moss-700',
  finishing: 'border-walnut-500 bg-walnut-50 text-walnut-800',
  done: 'border-walnut-800 bg-walnut-800 text-paper',
};

/** The stage in words with its own shape; the tint only helps, it never carries the meaning alone. */
export function PieceStageBadge({ stage }: { stage: PieceStage }) {
  return (
    <span className={cx('inline-flex items-center gap-1.5 rounded-full border px-2.5 py-1 text-sm font-semibold', tint[stage])}>
      <StageIcon stage={stage} className="size-4" />
      <span>{stageWords[stage].label}</span>
    </span>
  );
}
