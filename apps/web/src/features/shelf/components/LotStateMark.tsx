import type { ReactNode } from 'react';
import { cx } from '../../../lib/cx';
import { lotStateWords, type LotShape, type LotState } from '../utils/lot-status';

// A crossed jar, an empty jar, a half-full jar and a full one: the state reads without colour.
const glyphs: Record<LotShape, ReactNode> = {
  cross: (
    <>
      <path d="M4 4h8v9H4z" fill="none" />
      <path d="m2.5 2.5 11 11" />
    </>
  ),
  empty: <path d="M4 4h8v9H4z" fill="none" />,
  half: (
    <>
      <path d="M4 4h8v9H4z" fill="none" />
      <path d="M4 9.5h8V13H4z" className="fill-current" />
    </>
  ),
  full: <path d="M4 4h8v9H4z" className="fill-current" />,
};

const tint: Record<LotState, string> = {
  expired: 'border-ember-600 bg-ember-50 text-ember-700',
  used_up: 'border-walnut-300 bg-paper text-walnut-800',
  low: 'border-resin-500 bg-resin-50 text-resin-700',
  in_stock: 'border-moss-600 bg-moss-50 text-moss-700',
};

export function LotStateMark({ state }: { state: LotState }) {
  return (
    <span className={cx('inline-flex items-center gap-1.5 rounded-full border px-2.5 py-0.5 text-sm font-semibold', tint[state])}>
      <svg aria-hidden="true" viewBox="0 0 16 16" className="size-4 shrink-0 stroke-current stroke-[1.6]" strokeLinecap="round">
        {glyphs[lotStateWords[state].shape]}
      </svg>
      {lotStateWords[state].label}
    </span>
  );
}
