import { can } from '@gelpoint/contracts';
import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router';
import { useSearchParams } from 'react-router';
import { Alert } from '../../../../components/ui/Alert';
import { Card } from '../../../../components/ui/Card';
import { DocumentTitle } from '../../../../components/ui/DocumentTitle';
import { EmptyState } from '../../../../components/ui/EmptyState';
import { PageHeader } from '../../../../components/ui/PageHeader';
import { Pager } from '../../../../components/ui/Pager';
import { QueryResult } from '../../../../components/ui/QueryResult';
import { paths } from '../../../../config/paths';
import { piecesQueryOptions, usePieces } from '../../../../features/pieces/api/get-pieces';
import { pourPlansQueryOptions, usePourPlans } from '../../../../features/pour-plans/api/get-pour-plans';
import { PlanAPour } from '../../../../features/pour-plans/components/PlanAPour';
import { PlanPieceFilter } from '../../../../features/pour-plans/components/PlanPieceFilter';
import { PourPlansTable } from '../../../../features/pour-plans/components/PourPlansTable';
import { planListQuery, plansPerPage, readPlanListFilters } from '../../../../features/pour-plans/utils/plan-list-filters';
import { requireSession } from '../../../session-loaders';
import { useSignedInSession } from '../../../signed-in-session';
import { useShop } from '../../../../features/shop/api/get-shop';
import { shopQueryOptions } from '../../../../lib/resources/shop';

// The piece picker and the piece names come from one page of the shop's pieces, the most the API gives at once.
const allPieces = { limit: 200, offset: 0 };

export const createLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireSession(queryClient, request);
    const filters = readPlanListFilters(new URL(request.url).searchParams);
    await Promise.all([
      queryClient.ensureQueryData(pourPlansQueryOptions(planListQuery(filters))),
      queryClient.ensureQueryData(piecesQueryOptions(allPieces)),
      queryClient.ensureQueryData(shopQueryOptions()),
    ]);
    return null;
  };

export function Component() {
  const session = useSignedInSession();
  const [search] = useSearchParams();
  const filters = readPlanListFilters(search);
  const plans = usePourPlans(planListQuery(filters));
  const pieces = usePieces(allPieces);
  const shop = useShop();
  const mayPlan = can(session.role, 'plan:change');
  const pieceList = pieces.data?.items ?? [];
  const pieceNames = new Map(pieceList.map((p) => [p.id, p.name]));
  const pages = Math.max(1, Math.ceil((plans.data?.total ?? 0) / plansPerPage));

  return (
    <>
      <DocumentTitle title="Pour plans" />
      <PageHeader title="Pour plans" description="What goes into every cup, layer by layer, for each piece." />
      {mayPlan ? (
        <Card className="mb-6">
          <PlanAPour key={filters.pieceId ?? ''} pieces={pieceList} pieceId={filters.pieceId} />
        </Card>
      ) : (
        <Alert tone="info" live="none" className="mb-6">
          You can open every plan and print its run sheet. Makers and the shop lead plan the pours.
        </Alert>
      )}
      <PlanPieceFilter key={`filter-${filters.pieceId ?? ''}`} pieces={pieceList} pieceId={filters.pieceId} />
      <QueryResult query={plans} loadingLabel="Loading pour plans…">
        {(list) =>
          list.items.length === 0 ? (
            <EmptyState title={filters.pieceId ? 'No pour plans for this piece yet' : 'No pour plans yet'}>
              A pour plan turns a cavity and a product into layers, cups and grams, with the run sheet to mix from.
            </EmptyState>
          ) : (
            <QueryResult query={shop} loadingLabel="Loading the shop's units…">
              {(current) => (
                <>
                  <p role="status" className="mb-3 text-ink-soft">
                    {list.total === 1 ? '1 pour plan' : `${list.total} pour plans`}
                  </p>
                  <PourPlansTable plans={list.items} pieceNames={pieceNames} unitSystem={current.unitSystem} />
                  <Pager
                    page={filters.page}
                    pageCount={pages}
                    label="Pages of pour plans"
                    hrefFor={(page) => paths.pourPlans.getHref({ ...(filters.pieceId ? { pieceId: filters.pieceId } : {}), page })}
                  />
                </>
              )}
            </QueryResult>
          )
        }
      </QueryResult>
    </>
  );
}
