import type { PourPlanList } from '@gelpoint/contracts';
import { formatMass, type UnitSystem } from '@gelpoint/core';
import type { z } from 'zod';
import { DateTime } from '../../../components/ui/DateTime';
import { TextLink } from '../../../components/ui/TextLink';
import { paths } from '../../../config/paths';

type PlanRow = z.infer<typeof PourPlanList>['items'][number];

export interface PiecePlansListProps {
  plans: readonly PlanRow[];
  /** The names of the moulds the page knows, to say which one a plan is cast in. */
  moldNames: ReadonlyMap<string, string>;
  unitSystem: UnitSystem;
}

/** A piece's pour plans: each a link, with its cavity (a mould, linked, or a quick shape) and what it weighs out. */
export function PiecePlansList({ plans, moldNames, unitSystem }: PiecePlansListProps) {
  return (
    <ul className="flex flex-col divide-y divide-line" aria-label="Pour plans of this piece">
      {plans.map((plan) => (
        <li key={plan.id} className="flex flex-wrap items-center justify-between gap-2 py-2">
          <span className="flex flex-col">
            <TextLink to={paths.pourPlan.getHref(plan.id)}>{plan.name}</TextLink>
            <span className="text-sm text-ink-soft">
              {plan.moldId ? (
                <>
                  Cast in <TextLink to={paths.mould.getHref(plan.moldId)}>{moldNames.get(plan.moldId) ?? 'its mould'}</TextLink>
                </>
              ) : (
                'From a quick shape'
              )}
              {' · '}
              {formatMass(plan.totalGrams, unitSystem).text} to weigh out
            </span>
          </span>
          <span className="text-sm text-ink-soft">
            Changed <DateTime iso={plan.updatedAt} />
          </span>
        </li>
      ))}
    </ul>
  );
}
