import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router';
import { ButtonLink } from '../../../components/ui/ButtonLink';
import { DocumentTitle } from '../../../components/ui/DocumentTitle';
import { EmptyState } from '../../../components/ui/EmptyState';
import { PageHeader } from '../../../components/ui/PageHeader';
import { QueryResult } from '../../../components/ui/QueryResult';
import { paths } from '../../../config/paths';
import { auditEventsQueryOptions, auditPageSize, useAuditEvents } from '../../../features/shop/api/get-audit-events';
import { AuditTable } from '../../../features/shop/components/AuditTable';
import { useAuditQuery } from '../../../features/shop/hooks/use-audit-query';
import { readAuditQuery } from '../../../features/shop/utils/audit-cursor';
import { can } from '../../../lib/authorization';
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
  const query = useAuditQuery();
  const events = useAuditEvents(query);
  return (
    <QueryResult query={events} loadingLabel="Loading events…">
      {(page) => {
        const oldest = page.items.at(-1);
        const maybeMore = page.items.length === auditPageSize && oldest !== undefined;
        return (
          <>
            {page.items.length === 0 ? (
              <EmptyState title={query.before ? 'No older events' : 'Nothing has happened yet'}>
                Sign-ins, changes to pieces, the team and the settings show up here.
              </EmptyState>
            ) : (
              <AuditTable events={page.items} />
            )}
            {query.before || maybeMore ? (
            <nav aria-label="Pages of events" className="mt-6 flex flex-wrap gap-2">
              {query.before ? (
                <ButtonLink variant="secondary" to={paths.audit.getHref()}>
                  Newest events
                </ButtonLink>
              ) : null}
              {maybeMore ? (
                <ButtonLink variant="secondary" to={paths.audit.getHref({ before: oldest.at })}>
                  Older events
                </ButtonLink>
              ) : null}
            </nav>
            ) : null}
          </>
        );
      }}
    </QueryResult>
  );
}
