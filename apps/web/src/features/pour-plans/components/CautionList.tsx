import type { Caution, CautionSeverity } from '@gelpoint/core';
import type { ReactNode } from 'react';
import { cx } from '../../../lib/cx';
import { severityWords } from '../utils/caution-words';

// A circle, a triangle and an octagon, each with its word: severity never rests on colour.
const glyphs: Record<CautionSeverity, ReactNode> = {
  info: <path d="M10 2a8 8 0 1 0 0 16 8 8 0 0 0 0-16Zm-.9 4h1.8v1.8H9.1V6Zm0 3.2h1.8V14H9.1V9.2Z" />,
  warning: <path d="M10 1.8 19 17.5H1L10 1.8Zm-.9 5.4v5h1.8v-5H9.1Zm0 6.3v1.8h1.8v-1.8H9.1Z" />,
  danger: <path d="M6.6 2h6.8L18 6.6v6.8L13.4 18H6.6L2 13.4V6.6L6.6 2Zm2.5 3.5v6h1.8v-6H9.1Zm0 7.3v1.8h1.8v-1.8H9.1Z" />,
};

const tint: Record<CautionSeverity, string> = {
  info: 'border-walnut-300 bg-walnut-50 text-walnut-900',
  warning: 'border-resin-500 bg-resin-50 text-resin-700',
  danger: 'border-ember-600 bg-ember-50 text-ember-700',
};

export function SeverityMark({ severity }: { severity: CautionSeverity }) {
  return (
    <span className="inline-flex shrink-0 items-center gap-1 font-bold">
      <svg aria-hidden="true" viewBox="0 0 20 20" className="size-5 fill-current">
        {glyphs[severity]}
      </svg>
      {severityWords[severity].label}:
    </span>
  );
}

/** The cautions about one thing, placed beside it; nothing at all when there are none. */
export function CautionList({ cautions, className, label }: { cautions: readonly Caution[]; className?: string; label?: string }) {
  if (cautions.length === 0) return null;
  return (
    <ul aria-label={label} className={cx('flex flex-col gap-2', className)}>
      {cautions.map((c, i) => (
        <li
          key={`${c.code}-${i}`}
          className={cx(
            'flex flex-wrap items-start gap-x-2 gap-y-1 rounded-lg border-l-4 border px-3 py-2 print:border-black print:bg-white print:text-black',
            tint[c.severity],
          )}
        >
          <SeverityMark severity={c.severity} />
          <span className="min-w-0 flex-1">{c.message}</span>
        </li>
      ))}
    </ul>
  );
}
