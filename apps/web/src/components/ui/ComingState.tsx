import { useId, type ReactNode } from 'react';

export interface ComingStateProps {
  /** What the area will do, in one sentence. */
  summary: ReactNode;
  /** The things it will hold, in the trade's words. */
  plans: readonly string[];
  children?: ReactNode;
}

/** An area that is planned but not built yet: say so kindly and say what is coming, rather than show an empty page. */
export function ComingState({ summary, plans, children }: ComingStateProps) {
  const headingId = useId();
  return (
    <section aria-labelledby={headingId} className="flex flex-col gap-4 rounded-xl border border-resin-300 bg-resin-50 p-5 sm:p-6">
      <div className="flex items-start gap-3">
        <svg aria-hidden="true" viewBox="0 0 32 32" className="size-8 shrink-0 text-resin-600">
          <path d="M16 3c-3.6 5-9 10.6-9 16.2a9 9 0 0 0 18 0C25 13.6 19.6 8 16 3Z" fill="none" stroke="currentColor" strokeWidth="2.2" />
          <path d="M8.2 21h15.6" stroke="currentColor" strokeWidth="2.2" strokeDasharray="3 2.5" strokeLinecap="round" />
        </svg>
        <div className="flex flex-col gap-1">
          <h2 id={headingId} className="text-xl font-bold text-walnut-900">
            Still curing
          </h2>
          <p className="text-base text-ink">This part of Gelpoint is on its way. {summary}</p>
        </div>
      </div>
      <div>
        <h3 className="mb-2 font-semibold text-walnut-900">What it will hold</h3>
        <ul className="flex list-disc flex-col gap-1.5 pl-6 text-ink marker:text-resin-500">
          {plans.map((plan) => (
            <li key={plan}>{plan}</li>
          ))}
        </ul>
      </div>
      {children}
    </section>
  );
}
