import type { QueryClient } from '@tanstack/react-query';
import { useNavigate, useParams, type LoaderFunctionArgs } from 'react-router';
import { Alert } from '../../../../components/ui/Alert';
import { Card } from '../../../../components/ui/Card';
import { DocumentTitle } from '../../../../components/ui/DocumentTitle';
import { PageHeader } from '../../../../components/ui/PageHeader';
import { QueryResult } from '../../../../components/ui/QueryResult';
import { TextLink } from '../../../../components/ui/TextLink';
import { paths } from '../../../../config/paths';
import { useArchivePigment } from '../../../../features/shelf/api/archive-pigment';
import { pigmentQueryOptions, usePigment } from '../../../../features/shelf/api/get-pigment';
import { useUpdatePigment } from '../../../../features/shelf/api/update-pigment';
import { ArchiveProductButton } from '../../../../features/shelf/components/ArchiveProductButton';
import { ArchivedMark } from '../../../../features/shelf/components/ArchivedMark';
import { PigmentForm } from '../../../../features/shelf/components/PigmentForm';
import { PigmentSheet } from '../../../../features/shelf/components/PigmentSheet';
import { mayKeepShelf } from '../../../../features/shelf/utils/shelf-access';
import { pigmentKindWords } from '../../../../features/shelf/utils/shelf-words';
import { shopQueryOptions, useShop } from '../../../../features/shop/api/get-shop';
import { requireSession } from '../../../session-loaders';
import { useSignedInSession } from '../../../signed-in-session';
import { readId } from './read-id';

export const createLoader =
  (queryClient: QueryClient) =>
  async ({ params, request }: LoaderFunctionArgs) => {
    await requireSession(queryClient, request);
    const id = readId(params, 'pigmentId', 'pigment');
    await Promise.all([queryClient.ensureQueryData(pigmentQueryOptions(id)), queryClient.ensureQueryData(shopQueryOptions())]);
    return null;
  };

export function Component() {
  const id = readId(useParams(), 'pigmentId', 'pigment');
  const session = useSignedInSession();
  const navigate = useNavigate();
  const pigment = usePigment(id);
  const shop = useShop();
  const update = useUpdatePigment();
  const archive = useArchivePigment({ onSuccess: () => navigate(paths.shelf.getHref({ tab: 'pigments' }), { replace: true }) });
  const mayKeep = mayKeepShelf(session.role);

  return (
    <QueryResult query={pigment} loadingLabel="Loading the pigment…">
      {(current) => (
        <>
          <DocumentTitle title={current.name} />
          <PageHeader
            eyebrow="Shelf · pigment"
            title={current.name}
            description={
              <>
                {pigmentKindWords[current.kind]} pigment
                {current.archived ? <ArchivedMark /> : null}
              </>
            }
            actions={
              mayKeep && !current.archived ? (
                <ArchiveProductButton name={current.name} busy={archive.isPending} error={archive.error} archive={() => archive.mutate(current.id)} reset={() => archive.reset()} />
              ) : null
            }
          />
          {mayKeep ? (
            <Card className="max-w-3xl">
              {update.isSuccess && !update.isPending ? (
                <Alert tone="success" className="mb-5">
                  Saved. Pour plans made from now on use these values; saved plans keep the ones they were made with.
                </Alert>
              ) : null}
              <PigmentForm
                key={current.updatedAt}
                pigment={current}
                submitLabel="Save pigment"
                busyLabel="Saving…"
                busy={update.isPending}
                save={(values) => update.mutateAsync({ pigmentId: current.id, values })}
              />
            </Card>
          ) : (
            <QueryResult query={shop} loadingLabel="Loading the shop's units…">
              {(s) => <PigmentSheet pigment={current} unitSystem={s.unitSystem} />}
            </QueryResult>
          )}
          <p className="mt-6">
            <TextLink to={paths.shelf.getHref({ tab: 'pigments' })}>Back to the shelf</TextLink>
          </p>
        </>
      )}
    </QueryResult>
  );
}
