import { can, Id } from '@gelpoint/contracts';
import type { QueryClient } from '@tanstack/react-query';
import { data, useNavigate, useParams, type LoaderFunctionArgs } from 'react-router';
import { Alert } from '../../../../components/ui/Alert';
import { ButtonLink } from '../../../../components/ui/ButtonLink';
import { Card } from '../../../../components/ui/Card';
import { DateTime } from '../../../../components/ui/DateTime';
import { DocumentTitle } from '../../../../components/ui/DocumentTitle';
import { PageHeader } from '../../../../components/ui/PageHeader';
import { QueryResult } from '../../../../components/ui/QueryResult';
import { TextLink } from '../../../../components/ui/TextLink';
import { paths } from '../../../../config/paths';
import { pieceQueryOptions, usePiece } from '../../../../features/pieces/api/get-piece';
import { useUpdatePiece } from '../../../../features/pieces/api/update-piece';
import { DeletePieceButton } from '../../../../features/pieces/components/DeletePieceButton';
import { PieceDetails } from '../../../../features/pieces/components/PieceDetails';
import { PieceForm } from '../../../../features/pieces/components/PieceForm';
import { PieceStageBadge } from '../../../../features/pieces/components/PieceStageBadge';
import { requireSession } from '../../../session-loaders';
import { useSignedInSession } from '../../../signed-in-session';
import { PieceWork, prefetchPieceWork } from './piece-work';

function readPieceId(params: Record<string, string | undefined>): string {
  const parsed = Id.safeParse(params.pieceId);
  // Not an id at all: the same answer as an id that does not exist, without asking the API.
  if (!parsed.success) throw data('No such piece', { status: 404 });
  return parsed.data;
}

export const createLoader =
  (queryClient: QueryClient) =>
  async ({ params, request }: LoaderFunctionArgs) => {
    await requireSession(queryClient, request);
    const pieceId = readPieceId(params);
    prefetchPieceWork(queryClient, pieceId);
    await queryClient.ensureQueryData(pieceQueryOptions(pieceId));
    return null;
  };

export function Component() {
  const params = useParams();
  const pieceId = readPieceId(params);
  const session = useSignedInSession();
  const navigate = useNavigate();
  const piece = usePiece(pieceId);
  const update = useUpdatePiece();
  const mayEdit = can(session.role, 'piece:edit');
  const mayDelete = can(session.role, 'piece:delete');

  return (
    <QueryResult query={piece} loadingLabel="Loading the piece…">
      {(current) => (
        <>
          <DocumentTitle title={current.name} />
          <PageHeader
            eyebrow="Piece"
            title={current.name}
            description={<PieceStageBadge stage={current.stage} />}
            actions={
              <>
                <ButtonLink variant="secondary" to={paths.pourPlans.getHref({ pieceId: current.id })}>
                  Pour plans
                </ButtonLink>
                <ButtonLink variant="secondary" to={paths.pieceRecord.getHref(current.id)}>
                  Cure record
                </ButtonLink>
                {mayEdit ? (
                  <>
                    <ButtonLink variant="secondary" to={paths.newMould.getHref({ pieceId: current.id })}>
                      Upload its mould
                    </ButtonLink>
                    <ButtonLink to={paths.newPourPlan.getHref(current.id)}>Plan a pour</ButtonLink>
                  </>
                ) : null}
                {mayDelete ? <DeletePieceButton piece={current} onDeleted={() => navigate(paths.pieces.getHref(), { replace: true })} /> : null}
              </>
            }
          />
          {mayEdit ? (
            <div className="grid gap-6 lg:grid-cols-[minmax(0,2fr)_minmax(0,1fr)]">
              <Card title="Details">
                {update.isSuccess && !update.isPending ? (
                  <Alert tone="success" className="mb-5">
                    Saved.
                  </Alert>
                ) : null}
                <PieceForm
                  key={current.id}
                  piece={current}
                  submitLabel="Save changes"
                  busyLabel="Saving…"
                  busy={update.isPending}
                  save={(values) => update.mutateAsync({ pieceId: current.id, changes: values })}
                />
              </Card>
              <Card title="Record">
                <dl className="flex flex-col gap-3">
                  <div>
                    <dt className="font-semibold text-ink-soft">Started by</dt>
                    <dd>{current.createdBy?.name ?? 'A former member'}</dd>
                  </div>
                  <div>
                    <dt className="font-semibold text-ink-soft">Created</dt>
                    <dd>
                      <DateTime iso={current.createdAt} />
                    </dd>
                  </div>
                  <div>
                    <dt className="font-semibold text-ink-soft">Last changed</dt>
                    <dd>
                      <DateTime iso={current.updatedAt} />
                    </dd>
                  </div>
                </dl>
              </Card>
            </div>
          ) : (
            <Card title="Details">
              <PieceDetails piece={current} />
            </Card>
          )}
          <PieceWork pieceId={current.id} />
          <p className="mt-6">
            <TextLink to={paths.pieces.getHref()}>Back to all pieces</TextLink>
          </p>
        </>
      )}
    </QueryResult>
  );
}
