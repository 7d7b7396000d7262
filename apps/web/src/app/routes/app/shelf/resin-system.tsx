import { can } from '@gelpoint/contracts';
import type { QueryClient } from '@tanstack/react-query';
import { useNavigate, useParams, type LoaderFunctionArgs } from 'react-router';
import { QueryResult } from '../../../../components/ui/QueryResult';
import { paths } from '../../../../config/paths';
import { useArchiveResinSystem } from '../../../../features/shelf/api/archive-resin-system';
import { resinSystemQueryOptions, useResinSystem } from '../../../../features/shelf/api/get-resin-system';
import { useUpdateResinSystem } from '../../../../features/shelf/api/update-resin-system';
import { ProductPage } from '../../../../features/shelf/components/ProductPage';
import { ResinSystemForm } from '../../../../features/shelf/components/ResinSystemForm';
import { ResinSystemSheet } from '../../../../features/shelf/components/ResinSystemSheet';
import { resinUseWords } from '../../../../features/shelf/utils/shelf-words';
import { requireSession } from '../../../session-loaders';
import { useSignedInSession } from '../../../signed-in-session';
import { readId } from './read-id';
import { useShop } from '../../../../features/shop/api/get-shop';
import { shopQueryOptions } from '../../../../lib/resources/shop';

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
  const mayKeep = can(session.role, 'shelf:keep');

  return (
    <QueryResult query={resinSystem} loadingLabel="Loading the resin system…">
      {(current) => (
        <ProductPage
          product={current}
          kind="resin system"
          description={
            <>
              {resinUseWords[current.use]}
              {current.maker ? ` by ${current.maker}` : ''}
            </>
          }
          mayKeep={mayKeep}
          archive={archive}
          saved={update.isSuccess && !update.isPending}
          cardClassName="max-w-4xl"
          form={
            <ResinSystemForm
              key={current.updatedAt}
              resinSystem={current}
              submitLabel="Save data sheet"
              busyLabel="Saving…"
              busy={update.isPending}
              save={(values) => update.mutateAsync({ resinSystemId: current.id, values })}
            />
          }
          shop={shop}
          sheet={(unitSystem, currency) => <ResinSystemSheet resinSystem={current} unitSystem={unitSystem} currency={currency} />}
          backHref={paths.shelf.getHref()}
        />
      )}
    </QueryResult>
  );
}
