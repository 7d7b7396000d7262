import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router';
import { DocumentTitle } from '../../../components/ui/DocumentTitle';
import { PageHeader } from '../../../components/ui/PageHeader';
import { QueryResult } from '../../../components/ui/QueryResult';
import { SafetyNote } from '../../../components/ui/SafetyNote';
import { TextLink } from '../../../components/ui/TextLink';
import { paths } from '../../../config/paths';
import { todayQueryOptions, useToday } from '../../../features/pours/api/get-today';
import { TodayList } from '../../../features/pours/components/TodayList';
import { requireSession } from '../../session-loaders';
import { useSignedInSession } from '../../signed-in-session';

export const createLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireSession(queryClient, request);
    await queryClient.ensureQueryData(todayQueryOptions());
    return null;
  };

export function Component() {
  const session = useSignedInSession();
  const today = useToday();
  return (
    <>
      <DocumentTitle title="Today" />
      <PageHeader title="Today" eyebrow={session.shop.name} description={`Good to see you, ${session.user.name}.`} />
      <div className="flex flex-col gap-6">
        <QueryResult query={today} loadingLabel="Loading what is due…">
          {(current) => <TodayList today={current} />}
        </QueryResult>
        <p className="flex flex-wrap gap-x-6">
          <TextLink to={paths.cureBoard.getHref()}>The cure board</TextLink>
          <TextLink to={paths.newPour.getHref()}>Start a pour</TextLink>
        </p>
        <SafetyNote />
      </div>
    </>
  );
}
