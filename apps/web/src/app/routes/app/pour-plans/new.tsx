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
import { pieceQueryOptions, usePiece } from '../../../../features/pieces/api/get-piece';
import { useCreatePourPlan } from '../../../../features/pour-plans/api/create-pour-plan';
import { pieceMoldsQueryOptions } from '../../../../features/pour-plans/api/get-piece-molds';
import { PourPlanner } from '../../../../features/pour-plans/components/PourPlanner';
import { newPlannerValues } from '../../../../features/pour-plans/utils/planner-values';
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
    const pieceId = readId(params, 'pieceId', 'piece');
    await Promise.all([
      queryClient.ensureQueryData(pieceQueryOptions(pieceId)),
      queryClient.ensureQueryData(shopQueryOptions()),
      queryClient.ensureQueryData(resinSystemsQueryOptions(wholeShelfQuery)),
      queryClient.ensureQueryData(pigmentsQueryOptions(wholeShelfQuery)),
      queryClient.prefetchQuery(pieceMoldsQueryOptions(pieceId)),
    ]);
    return null;
  };

export function Component() {
  const pieceId = readId(useParams(), 'pieceId', 'piece');
  const session = useSignedInSession();
  const navigate = useNavigate();
  const piece = usePiece(pieceId);
  const shop = useShop();
  const resinSystems = useResinSystems(wholeShelfQuery);
  const pigments = usePigments(wholeShelfQuery);
  const create = useCreatePourPlan({ onSuccess: (plan) => navigate(paths.pourPlan.getHref(plan.id), { replace: true }) });

  const failed = piece.error ?? shop.error ?? resinSystems.error ?? pigments.error;
  const body = () => {
    if (!can(session.role, 'plan:change')) {
      return (
        <Alert tone="warning" title="Your role can't plan pours" live="none">
          You are signed in as {roleLabel(session.role).toLowerCase()}. Makers and the shop lead plan pours; the run sheet of every plan is open to you.
        </Alert>
      );
    }
    if (failed) return <ErrorAlert error={failed} />;
    if (!piece.data || !shop.data || !resinSystems.data || !pigments.data) return <PageSpinner label="Loading the shelf…" />;
    if (resinSystems.data.items.every((r) => r.archived)) {
      return (
        <Alert tone="info" title="The shelf has no resin system yet" live="none">
          A pour plan needs a product from the shelf. Ask your shop lead to add one from its data sheet.
        </Alert>
      );
    }
    return (
      <PourPlanner
        pieceId={pieceId}
        initialValues={newPlannerValues(`${piece.data.name}, pour plan`.slice(0, 120))}
        resinSystems={resinSystems.data.items}
        pigments={pigments.data.items}
        unitSystem={shop.data.unitSystem}
        currency={shop.data.currency}
        scaleResolutionG={shop.data.scaleResolutionG}
        offRatioTolerancePct={shop.data.offRatioTolerancePct}
        renderMould3D={(view) => <PlanMould3D {...view} unitSystem={shop.data.unitSystem} />}
        submitLabel="Save pour plan"
        busy={create.isPending}
        save={(input) => create.mutateAsync(input)}
        draftPlace={{ pieceId, planId: null }}
        basedOn={null}
      />
    );
  };

  return (
    <>
      <DocumentTitle title="Plan a pour" />
      <PageHeader
        eyebrow={piece.data ? `Pour plan · ${piece.data.name}` : 'Pour plan'}
        title="Plan a pour"
        description="The numbers on the right follow what you type; saving works them out again on the server."
      />
      {body()}
      <p className="mt-6">
        <TextLink to={paths.pourPlans.getHref({ pieceId })}>Back to this piece&apos;s pour plans</TextLink>
      </p>
    </>
  );
}
