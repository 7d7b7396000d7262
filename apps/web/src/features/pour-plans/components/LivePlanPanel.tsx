import type { UnitSystem } from '@gelpoint/core';
import { useId } from 'react';
import { Alert } from '../../../components/ui/Alert';
import type { LivePlanState } from '../hooks/use-live-plan';
import { PlanResult } from './PlanResult';

const shownMissing = 4;

/** The numbers for the form as it stands, or what is still missing before there can be any. */
export function LivePlanPanel({ live, unitSystem, currency }: { live: LivePlanState; unitSystem: UnitSystem; currency: string }) {
  const headingId = useId();
  const missing = live.check.ok ? [] : Object.values(live.check.fieldErrors);
  const plan = live.result?.ok ? live.result.value : null;

  return (
    <section aria-labelledby={headingId} className="flex flex-col gap-4">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h2 id={headingId} className="text-xl font-bold text-walnut-900">
          Live numbers
        </h2>
        <p role="status" className="text-sm text-ink-soft">
          {live.updating
            ? 'Updating…'
            : plan
              ? `Worked out in this browser for ${plan.plan.fill.layerCount === 1 ? '1 layer' : `${plan.plan.fill.layerCount} layers`}; saving recomputes on the server.`
              : ''}
        </p>
      </div>
      {live.moldProblem ? (
        <Alert tone="warning" live="none" title="No numbers from the mould">
          {live.moldProblem}
        </Alert>
      ) : null}
      {missing.length > 0 ? (
        <Alert tone="info" live="none" title="The numbers appear once the plan is complete">
          <ul className="list-disc pl-5">
            {missing.slice(0, shownMissing).map((message) => (
              <li key={message}>{message.charAt(0).toUpperCase() + message.slice(1)}</li>
            ))}
          </ul>
          {missing.length > shownMissing ? <p>…and {missing.length - shownMissing} more.</p> : null}
        </Alert>
      ) : null}
      {live.result && !live.result.ok ? (
        <Alert tone="warning" live="none" title="This plan cannot be worked out yet">
          {live.result.error.message}
        </Alert>
      ) : null}
      {plan ? <PlanResult plan={plan.plan} unitSystem={unitSystem} currency={currency} curve={plan.cavity.curve} depthMap={plan.cavity.depthMap} /> : null}
    </section>
  );
}
