import { can } from '@gelpoint/contracts';
import type { QueryClient } from '@tanstack/react-query';
import { useNavigate, useParams, useSearchParams, type LoaderFunctionArgs } from 'react-router';
import { Card } from '../../../../components/ui/Card';
import { DocumentTitle } from '../../../../components/ui/DocumentTitle';
import { PageHeader } from '../../../../components/ui/PageHeader';
import { QueryResult } from '../../../../components/ui/QueryResult';
import { TextLink } from '../../../../components/ui/TextLink';
import { paths } from '../../../../config/paths';
import { lotQueryOptions, useLot } from '../../../../features/shelf/api/get-lot';
import { lotUsesQueryOptions } from '../../../../features/shelf/api/get-lot-uses';
import { useUpdateLot } from '../../../../features/shelf/api/update-lot';
import { DeleteLotButton } from '../../../../features/shelf/components/DeleteLotButton';
import { LotEditForm } from '../../../../features/shelf/components/LotEditForm';
import { LotSheet } from '../../../../features/shelf/components/LotSheet';
import { LotUses } from '../../../../features/shelf/components/LotUses';
import { LotStateMark } from '../../../../features/shelf/components/LotStateMark';
import { lotStateOf } from '../../../../features/shelf/utils/lot-status';
import { lotPartWords } from '../../../../features/shelf/utils/shelf-words';
import { requireSession } from '../../../session-loaders';
import { useSignedInSession } from '../../../signed-in-session';
import { readId } from './read-id';
import { useShop } from '../../../../features/shop/api/get-shop';
import { shopQueryOptions } from '../../../../lib/resources/shop';

/** The page of batches shown: a whole number from 1, whatever the address says. */
function usesPageOf(search: URLSearchParams): number {
  const page = Number(search.get('page'));
  return Number.isInteger(page) && page >= 1 && page <= 100_000 ? page : 1;
}

export const createLoader =
  (queryClient: QueryClient) =>
  async ({ params, request }: LoaderFunctionArgs) => {
    await requireSession(queryClient, request);
    const id = readId(params, 'lotId', 'lot');
    const page = usesPageOf(new URL(request.url).searchParams);
    await Promise.all([
      queryClient.ensureQueryData(lotQueryOptions(id)),
      queryClient.ensureQueryData(shopQueryOptions()),
      queryClient.ensureQueryData(lotUsesQueryOptions(id, page)),
    ]);
    return null;
  };

export function Component() {
  const id = readId(useParams(), 'lotId', 'lot');
  const session = useSignedInSession();
  const navigate = useNavigate();
  const lot = useLot(id);
  const [search] = useSearchParams();
  const usesPage = usesPageOf(search);
  const shop = useShop();
  const update = useUpdateLot();
  const mayKeep = can(session.role, 'shelf:keep');
  const backToLots = paths.shelf.getHref({ tab: 'lots' });

  return (
    <QueryResult query={lot} loadingLabel="Loading the lot…">
      {(current) => (
        <>
          <DocumentTitle title={`Lot ${current.lotNumber}`} />
          <PageHeader
            eyebrow={`Shelf · ${lotPartWords[current.part]}`}
            title={`Lot ${current.lotNumber}`}
            description={
              <span className="flex flex-wrap items-center gap-2">
                {current.productName} <LotStateMark state={lotStateOf(current)} />
              </span>
            }
            actions={mayKeep ? <DeleteLotButton lot={current} onDeleted={() => navigate(backToLots, { replace: true })} /> : null}
          />
          <QueryResult query={shop} loadingLabel="Loading the shop's units…">
            {(s) => (
              <>
                <LotSheet lot={current} unitSystem={s.unitSystem} />
                <LotUses
                  lotId={current.id}
                  lotNumber={current.lotNumber}
                  unitSystem={s.unitSystem}
                  page={usesPage}
                  hrefFor={(page) => paths.lot.getHref(current.id, { page })}
                />
              </>
            )}
          </QueryResult>
          {mayKeep ? (
            <Card title="Correct this lot" className="mt-6 max-w-3xl">
              <LotEditForm key={current.id} lot={current} busy={update.isPending} save={(changes) => update.mutateAsync({ lotId: current.id, changes })} />
            </Card>
          ) : null}
          <p className="mt-6">
            <TextLink to={backToLots}>Back to the lots</TextLink>
          </p>
        </>
      )}
    </QueryResult>
  );
}
