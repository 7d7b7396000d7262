import type { QueryClient } from '@tanstack/react-query';
import { useNavigate, useParams, type LoaderFunctionArgs } from 'react-router';
import { Alert } from '../../../../components/ui/Alert';
import { Card } from '../../../../components/ui/Card';
import { DocumentTitle } from '../../../../components/ui/DocumentTitle';
import { PageHeader } from '../../../../components/ui/PageHeader';
import { QueryResult } from '../../../../components/ui/QueryResult';
import { TextLink } from '../../../../components/ui/TextLink';
import { paths } from '../../../../config/paths';
import { useArchiveResinSystem } from '../../../../features/shelf/api/archive-resin-system';
import { resinSystemQueryOptions, useResinSystem } from '../../../../features/shelf/api/get-resin-system';
import { useUpdateResinSystem } from '../../../../features/shelf/api/update-resin-system';
import { ArchiveProductButton } from '../../../../features/shelf/components/ArchiveProductButton';
import { ArchivedMark } from '../../../../features/shelf/components/ArchivedMark';
import { ResinSystemForm } from '../../../../features/shelf/components/ResinSystemForm';
import { ResinSystemSheet } from '../../../../features/shelf/components/ResinSystemSheet';
import { mayKeepShelf } from '../../../../features/shelf/utils/shelf-access';
import { resinUseWords } from '../../../../features/shelf/utils/shelf-words';
import { shopQueryOptions, useShop } from '../../../../features/shop/api/get-shop';
import { requireSession } from '../../../session-loaders';
import { useSignedInSession } from '../../../signed-in-session';
import { readId } from './read-id';

export const createLoader =
  (queryClient: QueryClient) =>
  async ({ params, request }: LoaderFunctionArgs) => {
    await requireSession(queryClient, request);
    const id = readId(params, 'resinSystemId', 'resin system');
    await Promise.all([queryClient.ensureQueryData(resinSystemQueryOptions(id)), queryClient.ensureQueryData(shopQueryOptions())]);
    return null;
  };

export function Component() {
  const id = readId(useParams(), 'resinSystemId', 'resin system');
  const session = useSignedInSession();
  const navigate = useNavigate();
  const resinSystem = useResinSystem(id);
  const shop = useShop();
  const update = useUpdateResinSystem();
  const archive = useArchiveResinSystem({ onSuccess: () => navigate(paths.shelf.getHref(), { replace: true }) });
  const mayKeep = mayKeepShelf(session.role);

  return (
    <QueryResult query={resinSystem} loadingLabel="Loading the resin system…">
      {(current) => (
        <>
          <DocumentTitle title={current.name} />
          <PageHeader
            eyebrow="Shelf · resin system"
            title={current.name}
            description={
              <>
                {resinUseWords[current.use]}
                {current.maker ? ` by ${current.maker}` : ''}
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
            <Card className="max-w-4xl">
              {update.isSuccess && !update.isPending ? (
                <Alert tone="success" className="mb-5">
                  Saved. Pour plans made from now on use these values; saved plans keep the ones they were made with.
                </Alert>
              ) : null}
              <ResinSystemForm
                key={current.updatedAt}
                resinSystem={current}
                submitLabel="Save data sheet"
                busyLabel="Saving…"
                busy={update.isPending}
                save={(values) => update.mutateAsync({ resinSystemId: current.id, values })}
              />
            </Card>
          ) : (
            <QueryResult query={shop} loadingLabel="Loading the shop's units…">
              {(s) => <ResinSystemSheet resinSystem={current} unitSystem={s.unitSystem} />}
            </QueryResult>
          )}
          <p className="mt-6">
            <TextLink to={paths.shelf.getHref()}>Back to the shelf</TextLink>
          </p>
        </>
      )}
    </QueryResult>
  );
}
