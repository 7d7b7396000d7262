import type { PieceStage } from '@gelpoint/contracts';
import type { ReactNode } from 'react';
import { cx } from '../../../lib/cx';

// One silhouette per stage, so the stage reads without colour: hollow plan, drop, hourglass, tick, arrow out, plane, full block.
const shapes: Record<PieceStage, ReactNode> = {
  planning: <circle cx="10" cy="10" r="6.5" fill="none" strokeDasharray="3 2.4" />,
  pouring: <path d="M10 3c-2 2.8-5 6-5 9a5 5 0 0 0 10 0c0-3-3-6.2-5-9Z" fill="none" />,
  curing: <path d="M5.5 3h9M5.5 17h9M6.5 3c0 4 7 5 7 7s-7 3-7 7M13.5 3c0 4-7 5-7 7s7 3 7 7" fill="none" />,
  ready: (
    <>
      <circle cx="10" cy="10" r="7" fill="none" />
      <path d="m6.8 10.2 2.2 2.2 4.3-4.6" fill="none" />
    </>
  ),
  released: <path d="M4 9v7h12V9M10 12V3M6.5 6.5 10 3l3.5 3.5" fill="none" />,
  finishing: <path d="M3 14h10l4-4M3 14l2-4h8M6 17h8" fill="none" />,
  done: (
    <>
      <rect x="3.5" y="3.5" width="13" height="13" rx="2" className="fill-current" />
      <path d="m6.8 10.2 2.2 2.2 4.3-4.6" fill="none" className="stroke-white" />
    </>
  ),
};

export function StageIcon({ stage, className }: { stage: PieceStage; className?: string }) {
  return (
    <svg
      aria-hidden="true"
      viewBox="0 0 20 20"
      className={cx('size-5 shrink-0 stroke-current stroke-[1.7]', className)}
      strokeLinecap="round"
      strokeLinejoin="round"
    >
      {shapes[stage]}
    </svg>
  );
}
