import type { QueryClient } from '@tanstack/react-query';
import { useMemo } from 'react';
import { useSearchParams, type LoaderFunctionArgs } from 'react-router';
import { ButtonLink } from '../../../components/ui/ButtonLink';
import { DocumentTitle } from '../../../components/ui/DocumentTitle';
import { EmptyState } from '../../../components/ui/EmptyState';
import { PlusIcon } from '../../../components/ui/icons';
import { PageHeader } from '../../../components/ui/PageHeader';
import { QueryResult } from '../../../components/ui/QueryResult';
import { paths } from '../../../config/paths';
import { poursQueryOptions, usePours } from '../../../features/pours/api/get-pours';
import { CureBoardFilterForm } from '../../../features/pours/components/CureBoardFilterForm';
import { CureBoardList } from '../../../features/pours/components/CureBoardList';
import { CureBoardPager } from '../../../features/pours/components/CureBoardPager';
import { boardStatusLabels, cureBoardQuery, readCureBoardFilters } from '../../../features/pours/utils/cure-board-filters';
import { requireSession } from '../../session-loaders';
import { useSignedInSession } from '../../signed-in-session';

export const createLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireSession(queryClient, request);
    await queryClient.ensureQueryData(poursQueryOptions(cureBoardQuery(readCureBoardFilters(new URL(request.url).searchParams))));
    return null;
  };

export function Component() {
  const session = useSignedInSession();
  const [search] = useSearchParams();
  const filters = useMemo(() => readCureBoardFilters(search), [search]);
  const pours = usePours(cureBoardQuery(filters));
  const filtered = filters.status !== 'active' || filters.readyToday;

  return (
    <>
      <DocumentTitle title="Cure board" />
      <PageHeader
        title="Cure board"
        description="Every pour in the shop, how far its cure has come from the logged temperatures, and what comes next."
        actions={
          <ButtonLink to={paths.newPour.getHref()}>
            <PlusIcon />
            Start a pour
          </ButtonLink>
        }
      />
      <CureBoardFilterForm key={`${filters.status}|${String(filters.readyToday)}`} filters={filters} />
      <QueryResult query={pours} loadingLabel="Loading the cure board…">
        {(page) =>
          page.items.length === 0 ? (
            <EmptyState
              title={filtered ? 'No pours match' : 'Nothing is curing'}
              actions={
                filtered ? (
                  <ButtonLink variant="secondary" to={paths.cureBoard.getHref()}>
                    Show pours curing now
                  </ButtonLink>
                ) : (
                  <ButtonLink to={paths.newPour.getHref()}>Start a pour</ButtonLink>
                )
              }
            >
              {filtered ? 'Try another status, or leave “Ready today” off.' : 'Start a pour from a saved pour plan; it shows here until it is machined.'}
            </EmptyState>
          ) : (
            <>
              <p role="status" className="mb-3 text-ink-soft">
                {page.total === 1 ? '1 pour' : `${page.total} pours`} · {boardStatusLabels[filters.status].toLowerCase()}
                {filters.readyToday ? ' · ready today' : ''}
              </p>
              <CureBoardList pours={page.items} role={session.role} />
              <CureBoardPager filters={filters} total={page.total} />
            </>
          )
        }
      </QueryResult>
    </>
  );
}
