import { useId, type InputHTMLAttributes, type ReactNode } from 'react';

/** One part of the planner as a fieldset, so its legend is read with each of its fields. */
export function PlannerSection({ legend, hint, children }: { legend: string; hint?: ReactNode; children: ReactNode }) {
  return (
    <fieldset className="flex flex-col gap-4 rounded-xl border border-line bg-white p-4 sm:p-5">
      <legend className="px-1 text-lg font-bold text-walnut-900">{legend}</legend>
      {hint ? <p className="-mt-2 text-sm text-ink-soft">{hint}</p> : null}
      {children}
    </fieldset>
  );
}

export function FieldGrid({ children }: { children: ReactNode }) {
  return <div className="grid gap-4 sm:grid-cols-2">{children}</div>;
}

/** A checkbox that switches a part of the plan on; its hint is announced with it but is not part of its name. */
export function Switch({ label, hint, inputProps }: { label: string; hint?: string; inputProps: InputHTMLAttributes<HTMLInputElement> }) {
  const id = useId();
  const hintId = hint ? `${id}-hint` : undefined;
  return (
    // The label stretches over the whole row, so the row is one target of at least 44 px while the name stays the label;
    // the box itself sits above that stretch, so a press on it lands on it.
    <div className="relative flex min-h-touch items-start gap-3">
      <input id={id} type="checkbox" aria-describedby={hintId} className="relative z-10 mt-1 size-5 accent-walnut-800" {...inputProps} />
      <div className="flex flex-col">
        <label htmlFor={id} className="cursor-pointer font-semibold after:absolute after:inset-0 after:content-['']">
          {label}
        </label>
        {hint ? (
          <p id={hintId} className="text-sm text-ink-soft">
            {hint}
          </p>
        ) : null}
      </div>
    </div>
  );
}
