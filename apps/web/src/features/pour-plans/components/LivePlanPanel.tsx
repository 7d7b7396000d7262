import type { MoldFill, MoldView } from '@gelpoint/contracts';
import type { PourPlan, UnitSystem } from '@gelpoint/core';
import { useId, type ReactNode } from 'react';
import type { ForecastHeat } from '../../../components/heat/heat-colours';
import { Alert } from '../../../components/ui/Alert';
import type { LivePlanState } from '../hooks/use-live-plan';
import { PlanResult } from './PlanResult';

const shownMissing = 4;

/** The mould in 3D coloured by the live forecast: drawn by the page, which may reach the moulds' 3D view. */
export type RenderPlanMould3D = (view: { heat: ForecastHeat; mold: MoldView; fill: MoldFill; plan: PourPlan }) => ReactNode;

/** The numbers for the form as it stands, or what is still missing before there can be any. */
export function LivePlanPanel({
  live,
  unitSystem,
  currency,
  renderMould3D,
}: {
  live: LivePlanState;
  unitSystem: UnitSystem;
  currency: string;
  renderMould3D?: RenderPlanMould3D | undefined;
}) {
  const headingId = useId();
  const missing = live.check.ok ? [] : Object.values(live.check.fieldErrors);
  const plan = live.result?.ok ? live.result.value : null;
  const mould = live.mould;

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
      {plan ? (
        <PlanResult
          plan={plan.plan}
          unitSystem={unitSystem}
          currency={currency}
          curve={plan.cavity.curve}
          depthMap={plan.cavity.depthMap}
          renderMould3D={renderMould3D && mould ? (heat) => renderMould3D({ heat, plan: plan.plan, ...mould }) : undefined}
        />
      ) : null}
    </section>
  );
}
