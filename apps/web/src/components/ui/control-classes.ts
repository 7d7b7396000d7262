/** One look for every text-like control: tall enough to hit, a border that stays visible against the paper. */
export const controlClasses =
  'block w-full min-h-touch rounded-lg border border-line-strong bg-white px-3 py-2 text-base text-ink placeholder:text-ink-soft/70 ' +
  'aria-[invalid=true]:border-ember-600 aria-[invalid=true]:border-2 disabled:bg-paper-deep disabled:text-ink-soft';
