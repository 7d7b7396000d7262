import { can } from '@gelpoint/contracts';
import type { QueryClient } from '@tanstack/react-query';
import { useMemo } from 'react';
import { useSearchParams, type LoaderFunctionArgs } from 'react-router';
import { buttonClasses } from '../../../components/ui/Button';
import { ButtonLink } from '../../../components/ui/ButtonLink';
import { DocumentTitle } from '../../../components/ui/DocumentTitle';
import { EmptyState } from '../../../components/ui/EmptyState';
import { PageHeader } from '../../../components/ui/PageHeader';
import { QueryResult } from '../../../components/ui/QueryResult';
import { paths } from '../../../config/paths';
import { auditExportHref } from '../../../features/shop/api/audit-export';
import { auditEventsQueryOptions, useAuditEvents } from '../../../features/shop/api/get-audit-events';
import { AuditFilterForm } from '../../../features/shop/components/AuditFilterForm';
import { AuditTable } from '../../../features/shop/components/AuditTable';
import { useAuditQuery } from '../../../features/shop/hooks/use-audit-query';
import { readAuditFilters, readAuditQuery } from '../../../features/shop/utils/audit-cursor';
import { useSignedInSession } from '../../signed-in-session';
import { requireSession } from '../../session-loaders';
import { LeadOnlyNotice } from './lead-only';

export const createLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const session = await requireSession(queryClient, request);
    if (can(session.role, 'audit:read')) {
      await queryClient.ensureQueryData(auditEventsQueryOptions(readAuditQuery(new URL(request.url).searchParams)));
    }
    return null;
  };

export function Component() {
  const session = useSignedInSession();
  return (
    <>
      <DocumentTitle title="Audit" />
      <PageHeader title="Audit" description="Who changed what in this shop, newest first." />
      {can(session.role, 'audit:read') ? <AuditArea /> : <LeadOnlyNotice area="the audit" role={session.role} />}
    </>
  );
}

function AuditArea() {
  const [search] = useSearchParams();
  const filters = useMemo(() => readAuditFilters(search), [search]);
  const query = useAuditQuery();
  const events = useAuditEvents(query);
  const filtered = Boolean(filters.who || filters.kind || filters.from || filters.to);
  return (
    <>
      <AuditFilterForm key={search.toString()} filters={filters} />
      <p className="mb-4">
        <a href={auditExportHref(filters)} download className={buttonClasses('secondary')}>
          Download {filtered ? 'these events' : 'the whole audit'} as CSV
        </a>
      </p>
      <QueryResult query={events} loadingLabel="Loading events…">
        {(page) => (
          <>
            {page.items.length === 0 ? (
              <EmptyState title={query.before ? 'No older events' : filtered ? 'No event matches' : 'Nothing has happened yet'}>
                {filtered ? 'Try another person, kind or range of days.' : 'Sign-ins, changes to pieces, the shelf, the team and the settings show up here.'}
              </EmptyState>
            ) : (
              <AuditTable events={page.items} />
            )}
            {query.before || page.next ? (
              <nav aria-label="Pages of events" className="mt-6 flex flex-wrap gap-2">
                {query.before ? (
                  <ButtonLink variant="secondary" to={paths.audit.getHref(filters)}>
                    Newest events
                  </ButtonLink>
                ) : null}
                {page.next ? (
                  <ButtonLink variant="secondary" to={paths.audit.getHref({ ...filters, before: page.next.before, beforeId: page.next.beforeId })}>
                    Older events
                  </ButtonLink>
                ) : null}
              </nav>
            ) : null}
          </>
        )}
      </QueryResult>
    </>
  );
}
