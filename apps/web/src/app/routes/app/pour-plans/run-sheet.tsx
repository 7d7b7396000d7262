import { useQuery } from '@tanstack/react-query';
import { useParams } from 'react-router';
import { Alert } from '../../../../components/ui/Alert';
import { Button } from '../../../../components/ui/Button';
import { DocumentTitle } from '../../../../components/ui/DocumentTitle';
import { ErrorAlert } from '../../../../components/ui/ErrorAlert';
import { PageSpinner } from '../../../../components/ui/PageSpinner';
import { TextLink } from '../../../../components/ui/TextLink';
import { paths } from '../../../../config/paths';
import { pieceQueryOptions } from '../../../../features/pieces/api/get-piece';
import { usePlanPour } from '../../../../features/pour-plans/api/get-plan-pour';
import { usePourPlan } from '../../../../features/pour-plans/api/get-pour-plan';
import { RunSheet } from '../../../../features/pour-plans/components/RunSheet';
import { readSavedPlan } from '../../../../features/pour-plans/utils/saved-plan';
import { appLink } from '../../../../lib/app-link';
import { createPlanPageLoader } from './plan-page-loader';
import { readId } from './read-id';
import { useShop } from '../../../../features/shop/api/get-shop';

export const createLoader = createPlanPageLoader;

/** A page of its own, outside the app frame, so what prints is the sheet and nothing else. */
export function Component() {
  const planId = readId(useParams(), 'planId', 'pour plan');
  const plan = usePourPlan(planId);
  const shop = useShop();
  const piece = useQuery({ ...pieceQueryOptions(plan.data?.pieceId ?? ''), enabled: Boolean(plan.data) });
  const startedPour = usePlanPour(planId);

  const body = () => {
    const failed = plan.error ?? shop.error;
    if (failed) return <ErrorAlert error={failed} />;
    // The codes must be right before anyone prints: wait to know whether a pour of this plan has started.
    if (!plan.data || !shop.data || startedPour.isPending) return <PageSpinner label="Loading the run sheet…" />;
    const pourId = startedPour.data ?? null;
    // Once a pour is started, every cup's code opens it (to log the cup); before, the plan.
    const cupLink = pourId
      ? { href: appLink(paths.pour.getHref(pourId)), opens: 'the pour' }
      : { href: appLink(paths.pourPlan.getHref(planId)), opens: 'the plan' };
    const saved = readSavedPlan(plan.data);
    if (!saved.ok) {
      return (
        <Alert tone="error" title="This plan's run sheet cannot be printed" live="none">
          {saved.error.message}
        </Alert>
      );
    }
    return (
      <RunSheet
        planName={plan.data.name}
        pieceName={piece.data?.name ?? 'Piece'}
        plan={saved.value.plan}
        snapshot={saved.value.snapshot}
        unitSystem={shop.data.unitSystem}
        currency={shop.data.currency}
        cupLink={cupLink}
      />
    );
  };

  return (
    <div className="min-h-dvh bg-white text-ink print:min-h-0">
      <DocumentTitle title={plan.data ? `Run sheet · ${plan.data.name}` : 'Run sheet'} />
      <div className="mx-auto flex max-w-4xl flex-col gap-4 px-4 py-6 print:max-w-none print:p-0">
        <nav aria-label="Run sheet" className="flex flex-wrap items-center justify-between gap-3 print:hidden">
          <TextLink to={paths.pourPlan.getHref(planId)}>Back to the plan</TextLink>
          <Button onClick={() => window.print()}>Print</Button>
        </nav>
        <main>{body()}</main>
      </div>
    </div>
  );
}
