import { can } from '@gelpoint/contracts';
import { useQuery } from '@tanstack/react-query';
import { useMemo } from 'react';
import { useNavigate, useParams } from 'react-router';
import { Alert } from '../../../../components/ui/Alert';
import { ButtonLink } from '../../../../components/ui/ButtonLink';
import { Card } from '../../../../components/ui/Card';
import { DateTime } from '../../../../components/ui/DateTime';
import { DocumentTitle } from '../../../../components/ui/DocumentTitle';
import { ErrorAlert } from '../../../../components/ui/ErrorAlert';
import { PageHeader } from '../../../../components/ui/PageHeader';
import { PageSpinner } from '../../../../components/ui/PageSpinner';
import { TextLink } from '../../../../components/ui/TextLink';
import { paths } from '../../../../config/paths';
import { pieceQueryOptions } from '../../../../features/pieces/api/get-piece';
import { useMold } from '../../../../features/pour-plans/api/get-mold';
import { usePourPlan } from '../../../../features/pour-plans/api/get-pour-plan';
import { DeletePourPlanButton } from '../../../../features/pour-plans/components/DeletePourPlanButton';
import { PlanResult } from '../../../../features/pour-plans/components/PlanResult';
import { SnapshotDetails } from '../../../../features/pour-plans/components/SnapshotDetails';
import { readSavedPlan } from '../../../../features/pour-plans/utils/saved-plan';
import { useSignedInSession } from '../../../signed-in-session';
import { createPlanPageLoader } from './plan-page-loader';
import { PlanMould3D } from './plan-mould-3d';
import { readId } from './read-id';
import { useShop } from '../../../../features/shop/api/get-shop';
import { moldFillQueryOptions } from '../../../../lib/resources/molds';

export const createLoader = createPlanPageLoader;

export function Component() {
  const planId = readId(useParams(), 'planId', 'pour plan');
  const session = useSignedInSession();
  const navigate = useNavigate();
  const plan = usePourPlan(planId);
  const shop = useShop();
  const piece = useQuery({ ...pieceQueryOptions(plan.data?.pieceId ?? ''), enabled: Boolean(plan.data) });
  const mold = useMold(plan.data?.moldId ?? null);
  const mayPlan = can(session.role, 'plan:change');
  // A mould plan's depth map at its level, to draw the forecast peak over the mould.
  const read = useMemo(() => (plan.data ? readSavedPlan(plan.data) : null), [plan.data]);
  const cavity = read?.ok ? read.value.input?.cavity : undefined;
  const fillLevelMm = read?.ok ? read.value.input?.fillLevelMm : undefined;
  const mapKey = cavity?.source === 'mold' && typeof fillLevelMm === 'number' ? { levelMm: fillLevelMm, dam: cavity.dam ?? 'outline', depthMap: true } : null;
  const fill = useQuery({
    ...moldFillQueryOptions(plan.data?.moldId ?? '', mapKey ?? { levelMm: 0, dam: 'outline', depthMap: true }, mold.data?.analysedAt ?? null),
    enabled: Boolean(mapKey && plan.data?.moldId && mold.data?.status === 'ready'),
  });
  const depthMap = mapKey ? (fill.data?.depthMap ?? undefined) : undefined;

  if (plan.error) return <ErrorAlert error={plan.error} />;
  if (shop.error) return <ErrorAlert error={shop.error} />;
  if (!plan.data || !shop.data) return <PageSpinner label="Loading the plan…" />;
  const current = plan.data;
  // Read once above (the stored result is parsed through its schema), for the depth map's key and for the page.
  const saved = read ?? readSavedPlan(current);

  return (
    <>
      <DocumentTitle title={current.name} />
      <PageHeader
        eyebrow="Pour plan"
        title={current.name}
        description={
          <>
            For <TextLink to={paths.piece.getHref(current.pieceId)}>{piece.data?.name ?? 'its piece'}</TextLink>, saved <DateTime iso={current.updatedAt} />
            {current.createdBy ? ` by ${current.createdBy.name}` : ''}.
            {current.moldId ? (
              <>
                {' '}
                Cast in <TextLink to={paths.mould.getHref(current.moldId)}>{mold.data?.name ?? 'its mould'}</TextLink>.
              </>
            ) : null}
          </>
        }
        actions={
          <>
            <ButtonLink to={paths.runSheet.getHref(current.id)}>Run sheet</ButtonLink>
            <ButtonLink variant="secondary" to={paths.newPour.getHref({ planId: current.id })}>
              Start the pour
            </ButtonLink>
            {mayPlan ? (
              <>
                {saved.ok && saved.value.input ? (
                  <ButtonLink variant="secondary" to={paths.editPourPlan.getHref(current.id)}>
                    Edit plan
                  </ButtonLink>
                ) : null}
                <DeletePourPlanButton
                  planId={current.id}
                  name={current.name}
                  onDeleted={() => navigate(paths.pourPlans.getHref({ pieceId: current.pieceId }), { replace: true })}
                />
              </>
            ) : null}
          </>
        }
      />
      {saved.ok ? (
        <div className="grid items-start gap-6 xl:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
          <section aria-labelledby="stored-result" className="flex min-w-0 flex-col gap-3">
            <h2 id="stored-result" className="text-xl font-bold text-walnut-900">
              The saved plan
            </h2>
            <p className="text-ink-soft">These are the numbers the server worked out and stored when the plan was saved.</p>
            <PlanResult
              plan={saved.value.plan}
              unitSystem={shop.data.unitSystem}
              currency={shop.data.currency}
              depthMap={depthMap}
              renderMould3D={
                mold.data && fill.data && depthMap
                  ? (heat) => <PlanMould3D mold={mold.data} fill={fill.data} plan={saved.value.plan} heat={heat} unitSystem={shop.data.unitSystem} />
                  : undefined
              }
            />
          </section>
          <Card title="Shelf values it was made with">
            <SnapshotDetails snapshot={saved.value.snapshot} unitSystem={shop.data.unitSystem} />
          </Card>
        </div>
      ) : (
        <Alert tone="error" title="This plan's stored numbers cannot be shown" live="none">
          {saved.error.message}
        </Alert>
      )}
      <p className="mt-6">
        <TextLink to={paths.pourPlans.getHref({ pieceId: current.pieceId })}>Back to this piece&apos;s pour plans</TextLink>
      </p>
    </>
  );
}
