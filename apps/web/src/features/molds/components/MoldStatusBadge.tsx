import { cx } from '../../../lib/cx';
import type { MoldStatus } from '../types';
import { moldStatusWords } from '../utils/mold-status';

const tint: Record<MoldStatus, string> = {
  queued: 'border-walnut-300 bg-paper text-walnut-800',
  analysing: 'border-resin-500 bg-resin-50 text-resin-700',
  ready: 'border-moss-600 bg-moss-50 text-moss-700',
  failed: 'border-ember-600 bg-ember-50 text-ember-700',
};

// Each status has its own shape, so the word and the shape carry it, not the tint.
const glyph: Record<MoldStatus, string> = {
  queued: 'M8 3v5l3 2',
  analysing: 'M3 8a5 5 0 0 1 10 0',
  ready: 'M4 8.5l2.5 2.5L12 5.5',
  failed: 'M5 5l6 6M11 5l-6 6',
};

export function MoldStatusBadge({ status }: { status: MoldStatus }) {
  return (
    <span className={cx('inline-flex items-center gap-1.5 rounded-full border px-2.5 py-1 text-sm font-semibold', tint[status])}>
      <svg aria-hidden="true" viewBox="0 0 16 16" className="size-4 fill-none stroke-current stroke-2" strokeLinecap="round">
        {status === 'queued' ? <circle cx="8" cy="8" r="6" /> : null}
        <path d={glyph[status]} />
      </svg>
      <span>{moldStatusWords[status].label}</span>
    </span>
  );
}
