import type { ReactNode } from 'react';

/** One block of a data sheet (mix, times, limits, price): a fieldset, so its legend is read with each field. */
export function FormSection({ legend, hint, children }: { legend: string; hint?: ReactNode; children: ReactNode }) {
  return (
    <fieldset className="flex flex-col gap-4 rounded-xl border border-line p-4 sm:p-5">
      <legend className="px-1 text-lg font-bold text-walnut-900">{legend}</legend>
      {hint ? <p className="-mt-2 text-sm text-ink-soft">{hint}</p> : null}
      <div className="grid gap-4 sm:grid-cols-2">{children}</div>
    </fieldset>
  );
}
