import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router';
import { DocumentTitle } from '../../../components/ui/DocumentTitle';
import { PageHeader } from '../../../components/ui/PageHeader';
import { CalendarFeedPanel } from '../../../features/account/components/CalendarFeedPanel';
import { roleLabel } from '../../../lib/roles';
import { requireSession } from '../../session-loaders';
import { useSignedInSession } from '../../signed-in-session';

export const createLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireSession(queryClient, request);
    return null;
  };

/** What belongs to the signed-in member rather than to the shop: for now, their calendar link. */
export function Component() {
  const session = useSignedInSession();
  return (
    <>
      <DocumentTitle title="Your account" />
      <PageHeader title="Your account" eyebrow={session.shop.name} description={`${session.user.name} · ${session.user.email} · ${roleLabel(session.role)}`} />
      <div className="flex flex-col gap-6">
        <CalendarFeedPanel calendarUrl={session.calendarUrl} />
      </div>
    </>
  );
}
