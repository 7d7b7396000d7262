import type { ReactNode } from 'react';
import { cx } from '../../../lib/cx';

// One silhouette per milestone so the stage reads without colour: an empty drop, a half-set drop, stacked layers,
// a fingertip, a crossed layer, an opened box, a full block and a router bit.
const shapes: Record<string, ReactNode> = {
  liquid: <path d="M10 2.5c-2.2 3-5.2 6.2-5.2 9.3a5.2 5.2 0 0 0 10.4 0c0-3.1-3-6.3-5.2-9.3Z" fill="none" />,
  gel: (
    <>
      <path d="M10 2.5c-2.2 3-5.2 6.2-5.2 9.3a5.2 5.2 0 0 0 10.4 0c0-3.1-3-6.3-5.2-9.3Z" fill="none" />
      <path d="M5 12.2h10a5 5 0 0 1-10 0Z" className="fill-current" />
    </>
  ),
  next_layer_opens: <path d="M3 14h14M3 10h14M10 3v5M7.5 5.5h5" fill="none" />,
  tack_free: <path d="M7 17V9.5a1.5 1.5 0 0 1 3 0V4.5a1.5 1.5 0 0 1 3 0V12M3 17h14" fill="none" />,
  next_layer_closes: <path d="M3 14h14M3 10h14M6 3l8 5M14 3 6 8" fill="none" />,
  demold: <path d="M3 9h14v8H3zM3 9l3-5h8l3 5" fill="none" />,
  full_cure: <rect x="3.5" y="3.5" width="13" height="13" rx="2" className="fill-current" />,
  ready_to_machine: <path d="M10 2v4M7 6h6l-1 5H8zM8.5 11 10 18l1.5-7" fill="none" />,
};

export function CureStageIcon({ stage, className }: { stage: string | null; className?: string }) {
  return (
    <svg
      aria-hidden="true"
      viewBox="0 0 20 20"
      className={cx('size-5 shrink-0 stroke-current stroke-[1.7]', className)}
      strokeLinecap="round"
      strokeLinejoin="round"
    >
      {shapes[stage ?? 'liquid'] ?? shapes.liquid}
    </svg>
  );
}
