import type { PourPlanList } from '@gelpoint/contracts';
import { formatMass, type UnitSystem } from '@gelpoint/core';
import type { z } from 'zod';
import { DateTime } from '../../../components/ui/DateTime';
import { LinkedList } from '../../../components/ui/LinkedList';
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
  const rows = plans.map((plan) => ({
    id: plan.id,
    to: paths.pourPlan.getHref(plan.id),
    name: plan.name,
    detail: (
      <>
        {plan.moldId ? (
          <>
            Cast in <TextLink to={paths.mould.getHref(plan.moldId)}>{moldNames.get(plan.moldId) ?? 'its mould'}</TextLink>
          </>
        ) : (
          'From a quick shape'
        )}
        {' · '}
        {formatMass(plan.totalGrams, unitSystem).text} to weigh out
      </>
    ),
    aside: (
      <span className="text-sm text-ink-soft">
        Changed <DateTime iso={plan.updatedAt} />
      </span>
    ),
  }));
  return <LinkedList label="Pour plans of this piece" rows={rows} />;
}
