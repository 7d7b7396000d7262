import { can } from '@gelpoint/contracts';
import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router';
import { Alert } from '../../../../components/ui/Alert';
import { ButtonLink } from '../../../../components/ui/ButtonLink';
import { DocumentTitle } from '../../../../components/ui/DocumentTitle';
import { EmptyState } from '../../../../components/ui/EmptyState';
import { PlusIcon } from '../../../../components/ui/icons';
import { PageHeader } from '../../../../components/ui/PageHeader';
import { QueryResult } from '../../../../components/ui/QueryResult';
import { paths } from '../../../../config/paths';
import { piecesQueryOptions, usePieces } from '../../../../features/pieces/api/get-pieces';
import { PieceFilterForm } from '../../../../features/pieces/components/PieceFilterForm';
import { PiecesList } from '../../../../features/pieces/components/PiecesList';
import { PiecesPager } from '../../../../features/pieces/components/PiecesPager';
import { usePieceFilters } from '../../../../features/pieces/hooks/use-piece-filters';
import { pieceListQuery, readPieceFilters } from '../../../../features/pieces/utils/piece-filters';
import { requireSession } from '../../../session-loaders';
import { useSignedInSession } from '../../../signed-in-session';

export const createLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireSession(queryClient, request);
    const filters = readPieceFilters(new URL(request.url).searchParams);
    await queryClient.ensureQueryData(piecesQueryOptions(pieceListQuery(filters)));
    return null;
  };

export function Component() {
  const session = useSignedInSession();
  const filters = usePieceFilters();
  const query = pieceListQuery(filters);
  const pieces = usePieces(query);
  const mayCreate = can(session.role, 'piece:create');
  const filtered = Boolean(filters.stage || filters.q);

  return (
    <>
      <DocumentTitle title="Pieces" />
      <PageHeader
        title="Pieces"
        description="Everything on the benches, from first plan to the finish coat."
        actions={
          mayCreate ? (
            <ButtonLink to={paths.newPiece.getHref()}>
              <PlusIcon />
              New piece
            </ButtonLink>
          ) : null
        }
      />
      {!mayCreate ? (
        <Alert tone="info" live="none" className="mb-6">
          You can look at every piece. Makers and the shop lead add and change them.
        </Alert>
      ) : null}
      <PieceFilterForm key={`${filters.stage ?? ''}|${filters.q ?? ''}`} filters={filters} />
      <QueryResult query={pieces} loadingLabel="Loading pieces…">
        {(list) =>
          list.items.length === 0 ? (
            filtered ? (
              <EmptyState
                title="No pieces match"
                actions={
                  <ButtonLink variant="secondary" to={paths.pieces.getHref()}>
                    Show all pieces
                  </ButtonLink>
                }
              >
                Try another stage or fewer words.
              </EmptyState>
            ) : (
              <EmptyState title="No pieces yet" actions={mayCreate ? <ButtonLink to={paths.newPiece.getHref()}>Start the first piece</ButtonLink> : null}>
                A piece is one casting: a river table, a tray, an inlay. Its pours, batches and cure log hang off it.
              </EmptyState>
            )
          ) : (
            <>
              <p role="status" className="mb-3 text-ink-soft">
                {list.total === 1 ? '1 piece' : `${list.total} pieces`}
                {filtered ? ' match' : ''}
              </p>
              <PiecesList pieces={list.items} />
              <PiecesPager filters={filters} total={list.total} />
            </>
          )
        }
      </QueryResult>
    </>
  );
}
