import { can, Id } from '@gelpoint/contracts';
import type { QueryClient } from '@tanstack/react-query';
import { data, useNavigate, useParams, type LoaderFunctionArgs } from 'react-router';
import { Card } from '../../../../components/ui/Card';
import { DateTime } from '../../../../components/ui/DateTime';
import { DocumentTitle } from '../../../../components/ui/DocumentTitle';
import { PageHeader } from '../../../../components/ui/PageHeader';
import { QueryResult } from '../../../../components/ui/QueryResult';
import { TextLink } from '../../../../components/ui/TextLink';
import { paths } from '../../../../config/paths';
import { useMold } from '../../../../features/molds/api/get-mold';
import { moldQueryOptions } from '../../../../lib/resources/molds';
import { AnalysisState } from '../../../../features/molds/components/AnalysisState';
import { DeleteMoldButton } from '../../../../features/molds/components/DeleteMoldButton';
import { MoldReport } from '../../../../features/molds/components/MoldReport';
import { MoldSettingsForm } from '../../../../features/molds/components/MoldSettingsForm';
import { MoldStatusBadge } from '../../../../features/molds/components/MoldStatusBadge';
import { piecesQueryOptions, usePieces } from '../../../../features/pieces/api/get-pieces';
import { requireSession } from '../../../session-loaders';
import { useSignedInSession } from '../../../signed-in-session';
import { useShop } from '../../../../features/shop/api/get-shop';
import { shopQueryOptions } from '../../../../lib/resources/shop';

const pieceNamesQuery = { limit: 200, offset: 0 };

function readMoldId(params: Record<string, string | undefined>): string {
  const parsed = Id.safeParse(params.moldId);
  // Not an id at all: the same answer as an id that does not exist, without asking the API.
  if (!parsed.success) throw data('No such mould', { status: 404 });
  return parsed.data;
}

export const createLoader =
  (queryClient: QueryClient) =>
  async ({ params, request }: LoaderFunctionArgs) => {
    await requireSession(queryClient, request);
    void queryClient.prefetchQuery(piecesQueryOptions(pieceNamesQuery));
    await Promise.all([queryClient.ensureQueryData(moldQueryOptions(readMoldId(params))), queryClient.ensureQueryData(shopQueryOptions())]);
    return null;
  };

export function Component() {
  const moldId = readMoldId(useParams());
  const session = useSignedInSession();
  const navigate = useNavigate();
  const mold = useMold(moldId);
  const shop = useShop();
  const pieces = usePieces(pieceNamesQuery);
  const unitSystem = shop.data?.unitSystem ?? 'metric';
  const mayChange = can(session.role, 'mold:change');

  return (
    <QueryResult query={mold} loadingLabel="Loading the mould…">
      {(current) => {
        const pieceName = current.pieceId ? pieces.data?.items.find((piece) => piece.id === current.pieceId)?.name : undefined;
        return (
          <>
            <DocumentTitle title={current.name} />
            <PageHeader
              eyebrow="Mould"
              title={current.name}
              description={
                <span className="flex flex-wrap items-center gap-x-3 gap-y-1 text-base">
                  <MoldStatusBadge status={current.status} />
                  {current.pieceId ? (
                    <TextLink to={paths.piece.getHref(current.pieceId)}>For {pieceName ?? 'its piece'}</TextLink>
                  ) : (
                    <span>Not tied to a piece</span>
                  )}
                  <span>
                    Uploaded <DateTime iso={current.createdAt} />
                  </span>
                </span>
              }
              actions={mayChange ? <DeleteMoldButton mold={current} onDeleted={() => navigate(paths.moulds.getHref(), { replace: true })} /> : null}
            />
            {current.status === 'ready' && current.report ? (
              <MoldReport key={current.id} mold={current} report={current.report} unitSystem={unitSystem} />
            ) : (
              <AnalysisState mold={current} mayUpload={mayChange} />
            )}
            {mayChange ? (
              <div className="mt-6">
                <Card title="Name, piece and frame">
                  <MoldSettingsForm key={current.id} mold={current} pieces={pieces.data?.items ?? []} />
                </Card>
              </div>
            ) : null}
            <p className="mt-6">
              <TextLink to={paths.moulds.getHref()}>Back to all moulds</TextLink>
            </p>
          </>
        );
      }}
    </QueryResult>
  );
}
