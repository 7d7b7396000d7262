import { can } from '@gelpoint/contracts';
import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router';
import { Alert } from '../../../../components/ui/Alert';
import { ButtonLink } from '../../../../components/ui/ButtonLink';
import { DocumentTitle } from '../../../../components/ui/DocumentTitle';
import { PlusIcon } from '../../../../components/ui/icons';
import { PageHeader } from '../../../../components/ui/PageHeader';
import { QueryResult } from '../../../../components/ui/QueryResult';
import { paths } from '../../../../config/paths';
import { lotsQueryOptions } from '../../../../features/shelf/api/get-lots';
import { pigmentsQueryOptions } from '../../../../features/shelf/api/get-pigments';
import { resinSystemsQueryOptions } from '../../../../features/shelf/api/get-resin-systems';
import { ShelfSearchForm } from '../../../../features/shelf/components/ShelfSearchForm';
import { LotsSection, PigmentsSection, ResinSystemsSection } from '../../../../features/shelf/components/ShelfSections';
import { ShelfTabs } from '../../../../features/shelf/components/ShelfTabs';
import { useShelfFilters } from '../../../../features/shelf/hooks/use-shelf-filters';
import { lotListQuery, pigmentListQuery, readShelfFilters, resinSystemListQuery, type ShelfTab } from '../../../../features/shelf/utils/shelf-queries';
import { requireSession } from '../../../session-loaders';
import { useSignedInSession } from '../../../signed-in-session';
import { useShop } from '../../../../features/shop/api/get-shop';
import { shopQueryOptions } from '../../../../lib/resources/shop';

export const createLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireSession(queryClient, request);
    const filters = readShelfFilters(new URL(request.url).searchParams);
    const list =
      filters.tab === 'lots'
        ? queryClient.ensureQueryData(lotsQueryOptions(lotListQuery(filters)))
        : filters.tab === 'pigments'
          ? queryClient.ensureQueryData(pigmentsQueryOptions(pigmentListQuery(filters)))
          : queryClient.ensureQueryData(resinSystemsQueryOptions(resinSystemListQuery(filters)));
    await Promise.all([list, queryClient.ensureQueryData(shopQueryOptions())]);
    return null;
  };

const addActions: Record<ShelfTab, { href: string; label: string }> = {
  'resin-systems': { href: paths.newResinSystem.getHref(), label: 'Add resin system' },
  pigments: { href: paths.newPigment.getHref(), label: 'Add pigment' },
  lots: { href: paths.newLot.getHref(), label: 'Receive a lot' },
};

const tabTitles: Record<ShelfTab, string> = { 'resin-systems': 'Resin systems', pigments: 'Pigments', lots: 'Lots' };

export function Component() {
  const session = useSignedInSession();
  const filters = useShelfFilters();
  const shop = useShop();
  const mayKeep = can(session.role, 'shelf:keep');
  const add = addActions[filters.tab];

  return (
    <>
      <DocumentTitle title={`Shelf · ${tabTitles[filters.tab]}`} />
      <PageHeader
        title="Shelf"
        description="The resin systems, pigments and lots the shop pours with."
        actions={
          mayKeep ? (
            <ButtonLink to={add.href}>
              <PlusIcon />
              {add.label}
            </ButtonLink>
          ) : null
        }
      />
      {!mayKeep ? (
        <Alert tone="info" live="none" className="mb-6">
          You can read everything on the shelf. The shop lead adds and corrects products and lots.
        </Alert>
      ) : null}
      <ShelfTabs current={filters.tab} />
      <ShelfSearchForm
        key={`${filters.tab}|${filters.q ?? ''}|${filters.status ?? ''}|${filters.part ?? ''}|${String(filters.includeArchived)}`}
        filters={filters}
      />
      <QueryResult query={shop} loadingLabel="Loading the shop's units…">
        {(current) => {
          const props = { filters, unitSystem: current.unitSystem, currency: current.currency, mayKeep };
          if (filters.tab === 'lots') return <LotsSection {...props} />;
          if (filters.tab === 'pigments') return <PigmentsSection {...props} />;
          return <ResinSystemsSection {...props} />;
        }}
      </QueryResult>
    </>
  );
}
