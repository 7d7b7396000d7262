import { can } from '@gelpoint/contracts';
import type { QueryClient } from '@tanstack/react-query';
import { useQueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router';
import { Card } from '../../../components/ui/Card';
import { DocumentTitle } from '../../../components/ui/DocumentTitle';
import { PageHeader } from '../../../components/ui/PageHeader';
import { QueryResult } from '../../../components/ui/QueryResult';
import { authKeys } from '../../../lib/resources/session';
import { ShopSettingsForm } from '../../../features/shop/components/ShopSettingsForm';
import { ThermometerToken } from '../../../features/shop/components/ThermometerToken';
import { useSignedInSession } from '../../signed-in-session';
import { requireSession } from '../../session-loaders';
import { LeadOnlyNotice } from './lead-only';
import { useShop } from '../../../features/shop/api/get-shop';
import { shopQueryOptions } from '../../../lib/resources/shop';

export const createLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const session = await requireSession(queryClient, request);
    if (can(session.role, 'shop:manage')) await queryClient.ensureQueryData(shopQueryOptions());
    return null;
  };

export function Component() {
  const session = useSignedInSession();
  return (
    <>
      <DocumentTitle title="Shop settings" />
      <PageHeader title="Shop settings" description="How Gelpoint measures and writes numbers for this shop." />
      {can(session.role, 'shop:manage') ? <SettingsArea /> : <LeadOnlyNotice area="the shop settings" role={session.role} />}
    </>
  );
}

function SettingsArea() {
  const queryClient = useQueryClient();
  const shop = useShop();
  return (
    <div className="flex max-w-2xl flex-col gap-6">
      <Card>
        <QueryResult query={shop} loadingLabel="Loading the settings…">
          {(current) => (
            <ShopSettingsForm
              key={current.id}
              shop={current}
              // The header shows the shop name from the session.
              onSaved={() => queryClient.invalidateQueries({ queryKey: authKeys.session() })}
            />
          )}
        </QueryResult>
      </Card>
      <Card>
        <ThermometerToken />
      </Card>
    </div>
  );
}
