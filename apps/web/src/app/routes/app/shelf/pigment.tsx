import { can } from '@gelpoint/contracts';
import type { QueryClient } from '@tanstack/react-query';
import { useNavigate, useParams, type LoaderFunctionArgs } from 'react-router';
import { QueryResult } from '../../../../components/ui/QueryResult';
import { paths } from '../../../../config/paths';
import { useArchivePigment } from '../../../../features/shelf/api/archive-pigment';
import { pigmentQueryOptions, usePigment } from '../../../../features/shelf/api/get-pigment';
import { useUpdatePigment } from '../../../../features/shelf/api/update-pigment';
import { PigmentForm } from '../../../../features/shelf/components/PigmentForm';
import { PigmentSheet } from '../../../../features/shelf/components/PigmentSheet';
import { ProductPage } from '../../../../features/shelf/components/ProductPage';
import { pigmentKindWords } from '../../../../features/shelf/utils/shelf-words';
import { requireSession } from '../../../session-loaders';
import { useSignedInSession } from '../../../signed-in-session';
import { readId } from './read-id';
import { useShop } from '../../../../features/shop/api/get-shop';
import { shopQueryOptions } from '../../../../lib/resources/shop';

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
  const mayKeep = can(session.role, 'shelf:keep');

  return (
    <QueryResult query={pigment} loadingLabel="Loading the pigment…">
      {(current) => (
        <ProductPage
          product={current}
          kind="pigment"
          description={`${pigmentKindWords[current.kind]} pigment`}
          mayKeep={mayKeep}
          archive={archive}
          saved={update.isSuccess && !update.isPending}
          cardClassName="max-w-3xl"
          form={
            <PigmentForm
              key={current.updatedAt}
              pigment={current}
              submitLabel="Save pigment"
              busyLabel="Saving…"
              busy={update.isPending}
              save={(values) => update.mutateAsync({ pigmentId: current.id, values })}
            />
          }
          shop={shop}
          sheet={(unitSystem, currency) => <PigmentSheet pigment={current} unitSystem={unitSystem} currency={currency} />}
          backHref={paths.shelf.getHref({ tab: 'pigments' })}
        />
      )}
    </QueryResult>
  );
}
