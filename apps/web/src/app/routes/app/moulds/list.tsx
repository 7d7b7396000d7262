import { can } from '@gelpoint/contracts';
import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router';
import { Alert } from '../../../../components/ui/Alert';
import { ButtonLink } from '../../../../components/ui/ButtonLink';
import { Card } from '../../../../components/ui/Card';
import { DocumentTitle } from '../../../../components/ui/DocumentTitle';
import { EmptyState } from '../../../../components/ui/EmptyState';
import { PlusIcon } from '../../../../components/ui/icons';
import { PageHeader } from '../../../../components/ui/PageHeader';
import { QueryResult } from '../../../../components/ui/QueryResult';
import { paths } from '../../../../config/paths';
import { moldsQueryOptions, useMolds } from '../../../../features/molds/api/get-molds';
import { MoldsTable } from '../../../../features/molds/components/MoldsTable';
import { QuickShapeForm } from '../../../../features/molds/components/QuickShapeForm';
import { piecesQueryOptions, usePieces } from '../../../../features/pieces/api/get-pieces';
import { requireSession } from '../../../session-loaders';
import { useSignedInSession } from '../../../signed-in-session';
import { useShop } from '../../../../features/shop/api/get-shop';
import { shopQueryOptions } from '../../../../lib/resources/shop';

const moldListQuery = { limit: 100, offset: 0 };
// Piece names for the table; the API lists at most 200 at a time.
const pieceNamesQuery = { limit: 200, offset: 0 };

export const createLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireSession(queryClient, request);
    void queryClient.prefetchQuery(piecesQueryOptions(pieceNamesQuery));
    await Promise.all([queryClient.ensureQueryData(moldsQueryOptions(moldListQuery)), queryClient.ensureQueryData(shopQueryOptions())]);
    return null;
  };

export function Component() {
  const session = useSignedInSession();
  const molds = useMolds(moldListQuery);
  const shop = useShop();
  const pieces = usePieces(pieceNamesQuery);
  const unitSystem = shop.data?.unitSystem ?? 'metric';
  const pieceNames = new Map((pieces.data?.items ?? []).map((piece) => [piece.id, piece.name]));
  const mayUpload = can(session.role, 'mold:change');
  const upload = (
    <ButtonLink to={paths.newMould.getHref()}>
      <PlusIcon />
      Upload a mould file
    </ButtonLink>
  );

  return (
    <>
      <DocumentTitle title="Moulds" />
      <PageHeader title="Moulds" description="The cavities your pieces are cast into, and how much resin each one takes." actions={mayUpload ? upload : null} />
      {!mayUpload ? (
        <Alert tone="info" live="none" className="mb-6">
          You can read every cavity report. Makers and the shop lead upload moulds.
        </Alert>
      ) : null}
      <div className="flex flex-col gap-8">
        <QueryResult query={molds} loadingLabel="Loading moulds…">
          {(list) =>
            list.items.length === 0 ? (
              <EmptyState title="No moulds yet" actions={mayUpload ? upload : null}>
                Upload a mould's STL, 3MF or OBJ to get its cavity report: the resin it takes to any level, the wetted area and the depth map.
              </EmptyState>
            ) : (
              <div className="flex flex-col gap-3">
                <p role="status" className="text-ink-soft">
                  {list.total === 1 ? '1 mould' : `${list.total} moulds`}
                  {list.total > list.items.length ? `, the newest ${list.items.length} shown` : ''}
                </p>
                <MoldsTable molds={list.items} pieceNames={pieceNames} unitSystem={unitSystem} />
              </div>
            )
          }
        </QueryResult>
        <Card title="No CAD file? Measure the cavity">
          <p className="mb-4 max-w-prose text-ink-soft">
            For a simple pocket, a few tape-measure readings give the same numbers a report would. Nothing is uploaded or saved.
          </p>
          <QuickShapeForm unitSystem={unitSystem} />
        </Card>
      </div>
    </>
  );
}
