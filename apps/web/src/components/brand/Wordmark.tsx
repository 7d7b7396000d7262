import { cx } from '../../lib/cx';

/** The Gelpoint mark: a drop filled to a level line, the moment the pour sets. */
export function GelpointGlyph({ className }: { className?: string }) {
  return (
    <svg aria-hidden="true" viewBox="0 0 24 24" className={cx('shrink-0', className)}>
      <path
        d="M12 2.6c-2.5 3.4-6.6 7.6-6.6 12a6.6 6.6 0 0 0 13.2 0c0-4.4-4.1-8.6-6.6-12z"
        fill="none"
        stroke="currentColor"
        strokeWidth="1.8"
        strokeLinejoin="round"
      />
      <path d="M5.5 14.2h13a6.5 6.5 0 1 1-13 0z" className="fill-resin-400" />
      <path d="M3.6 14.2h16.8" stroke="currentColor" strokeWidth="1.4" strokeLinecap="round" />
    </svg>
  );
}

export function Wordmark({ className, tone = 'dark' }: { className?: string; tone?: 'dark' | 'light' }) {
  return (
    <span className={cx('inline-flex items-center gap-2 text-2xl font-bold tracking-tight', tone === 'dark' ? 'text-walnut-900' : 'text-paper', className)}>
      <GelpointGlyph className="size-8" />
      <span>
        Gel<span className={tone === 'dark' ? 'text-resin-600' : 'text-resin-300'}>point</span>
      </span>
    </span>
  );
}
