import type { ReactNode } from 'react';
import type { StatusShape } from '../utils/status-words';

const glyphs: Record<StatusShape, ReactNode> = {
  dot: <circle cx="8" cy="8" r="4.5" className="fill-current" />,
  ring: <circle cx="8" cy="8" r="5" fill="none" />,
  cross: <path d="m4.5 4.5 7 7m0-7-7 7" fill="none" />,
  clock: (
    <>
      <circle cx="8" cy="8" r="5.5" fill="none" />
      <path d="M8 5v3.2l2 1.3" fill="none" />
    </>
  ),
  tick: <path d="m3.5 8.3 3 3 6-6.3" fill="none" />,
};

export function StatusMark({ shape, label }: { shape: StatusShape; label: string }) {
  return (
    <span className="inline-flex items-center gap-1.5 font-semibold">
      <svg aria-hidden="true" viewBox="0 0 16 16" className="size-4 shrink-0 stroke-current stroke-[1.8]" strokeLinecap="round">
        {glyphs[shape]}
      </svg>
      {label}
    </span>
  );
}
