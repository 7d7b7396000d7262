import { can } from '@gelpoint/contracts';
import type { QueryClient } from '@tanstack/react-query';
import { useNavigate, useParams, type LoaderFunctionArgs } from 'react-router';
import { Alert } from '../../../../components/ui/Alert';
import { DocumentTitle } from '../../../../components/ui/DocumentTitle';
import { ErrorAlert } from '../../../../components/ui/ErrorAlert';
import { PageHeader } from '../../../../components/ui/PageHeader';
import { PageSpinner } from '../../../../components/ui/PageSpinner';
import { TextLink } from '../../../../components/ui/TextLink';
import { paths } from '../../../../config/paths';
import { pieceMoldsQueryOptions } from '../../../../features/pour-plans/api/get-piece-molds';
import { usePourPlan } from '../../../../features/pour-plans/api/get-pour-plan';
import { pourPlanQueryOptions } from '../../../../lib/resources/pour-plans';
import { useUpdatePourPlan } from '../../../../features/pour-plans/api/update-pour-plan';
import { PourPlanner } from '../../../../features/pour-plans/components/PourPlanner';
import { plannerValuesOf } from '../../../../features/pour-plans/utils/planner-values';
import { mouldFrameInputsMessage, readSavedPlan, unreadableInputsMessage } from '../../../../features/pour-plans/utils/saved-plan';
import { pigmentsQueryOptions, usePigments } from '../../../../features/shelf/api/get-pigments';
import { resinSystemsQueryOptions, useResinSystems } from '../../../../features/shelf/api/get-resin-systems';
import { wholeShelfQuery } from '../../../../features/shelf/utils/shelf-queries';
import { roleLabel } from '../../../../lib/roles';
import { requireSession } from '../../../session-loaders';
import { useSignedInSession } from '../../../signed-in-session';
import { PlanMould3D } from './plan-mould-3d';
import { readId } from './read-id';
import { useShop } from '../../../../features/shop/api/get-shop';
import { shopQueryOptions } from '../../../../lib/resources/shop';

export const createLoader =
  (queryClient: QueryClient) =>
  async ({ params, request }: LoaderFunctionArgs) => {
    await requireSession(queryClient, request);
    const planId = readId(params, 'planId', 'pour plan');
    const [plan] = await Promise.all([
      queryClient.ensureQueryData(pourPlanQueryOptions(planId)),
      queryClient.ensureQueryData(shopQueryOptions()),
      queryClient.ensureQueryData(resinSystemsQueryOptions(wholeShelfQuery)),
      queryClient.ensureQueryData(pigmentsQueryOptions(wholeShelfQuery)),
    ]);
    // The mould picker opens on the plan's own mould: its options are there before the form is (a failure shows in
    // the planner, where the picker says the moulds cannot be listed).
    await queryClient.prefetchQuery(pieceMoldsQueryOptions(plan.pieceId));
    return null;
  };

export function Component() {
  const planId = readId(useParams(), 'planId', 'pour plan');
  const session = useSignedInSession();
  const navigate = useNavigate();
  const plan = usePourPlan(planId);
  const shop = useShop();
  const resinSystems = useResinSystems(wholeShelfQuery);
  const pigments = usePigments(wholeShelfQuery);
  const update = useUpdatePourPlan({ onSuccess: (saved) => navigate(paths.pourPlan.getHref(saved.id), { replace: true }) });

  const failed = plan.error ?? shop.error ?? resinSystems.error ?? pigments.error;
  const body = () => {
    if (!can(session.role, 'plan:change')) {
      return (
        <Alert tone="warning" title="Your role can't change pour plans" live="none">
          You are signed in as {roleLabel(session.role).toLowerCase()}. Makers and the shop lead change plans.
        </Alert>
      );
    }
    if (failed) return <ErrorAlert error={failed} />;
    if (!plan.data || !shop.data || !resinSystems.data || !pigments.data) return <PageSpinner label="Loading the plan…" />;
    const saved = readSavedPlan(plan.data);
    if (!saved.ok || !saved.value.input) {
      return (
        <Alert tone="error" title="This plan cannot be opened in the planner" live="none">
          {saved.ok ? (saved.value.levelInMouldFrame ? mouldFrameInputsMessage : unreadableInputsMessage) : saved.error.message}
        </Alert>
      );
    }
    return (
      <PourPlanner
        key={plan.data.updatedAt}
        pieceId={plan.data.pieceId}
        initialValues={plannerValuesOf(saved.value.input)}
        resinSystems={resinSystems.data.items}
        pigments={pigments.data.items}
        unitSystem={shop.data.unitSystem}
        currency={shop.data.currency}
        scaleResolutionG={shop.data.scaleResolutionG}
        offRatioTolerancePct={shop.data.offRatioTolerancePct}
        renderMould3D={(view) => <PlanMould3D {...view} unitSystem={shop.data.unitSystem} />}
        submitLabel="Save changes"
        busy={update.isPending}
        save={(input) => update.mutateAsync({ planId, values: input })}
        draftPlace={{ pieceId: plan.data.pieceId, planId }}
        basedOn={plan.data.updatedAt}
      />
    );
  };

  return (
    <>
      <DocumentTitle title={plan.data ? `Edit ${plan.data.name}` : 'Edit pour plan'} />
      <PageHeader
        eyebrow="Pour plan"
        title={plan.data ? `Edit ${plan.data.name}` : 'Edit pour plan'}
        description="Saving works the whole plan out again with the shelf as it is now, and takes a new snapshot of it."
      />
      {body()}
      <p className="mt-6">
        <TextLink to={paths.pourPlan.getHref(planId)}>Back to the plan</TextLink>
      </p>
    </>
  );
}
