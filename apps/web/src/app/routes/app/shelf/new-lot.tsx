import { can } from '@gelpoint/contracts';
import type { QueryClient } from '@tanstack/react-query';
import { useNavigate, type LoaderFunctionArgs } from 'react-router';
import { Card } from '../../../../components/ui/Card';
import { DocumentTitle } from '../../../../components/ui/DocumentTitle';
import { PageHeader } from '../../../../components/ui/PageHeader';
import { PageSpinner } from '../../../../components/ui/PageSpinner';
import { ErrorAlert } from '../../../../components/ui/ErrorAlert';
import { TextLink } from '../../../../components/ui/TextLink';
import { paths } from '../../../../config/paths';
import { useCreateLot } from '../../../../features/shelf/api/create-lot';
import { pigmentsQueryOptions, usePigments } from '../../../../features/shelf/api/get-pigments';
import { resinSystemsQueryOptions, useResinSystems } from '../../../../features/shelf/api/get-resin-systems';
import { LotForm } from '../../../../features/shelf/components/LotForm';
import { wholeShelfQuery } from '../../../../features/shelf/utils/shelf-queries';
import { LeadOnlyNotice } from '../lead-only';
import { requireSession } from '../../../session-loaders';
import { useSignedInSession } from '../../../signed-in-session';

export const createLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireSession(queryClient, request);
    await Promise.all([
      queryClient.ensureQueryData(resinSystemsQueryOptions(wholeShelfQuery)),
      queryClient.ensureQueryData(pigmentsQueryOptions(wholeShelfQuery)),
    ]);
    return null;
  };

export function Component() {
  const session = useSignedInSession();
  const navigate = useNavigate();
  const resinSystems = useResinSystems(wholeShelfQuery);
  const pigments = usePigments(wholeShelfQuery);
  const create = useCreateLot({ onSuccess: () => navigate(paths.shelf.getHref({ tab: 'lots' }), { replace: true }) });

  const body = () => {
    if (!can(session.role, 'shelf:keep')) return <LeadOnlyNotice area="the shelf" role={session.role} />;
    if (resinSystems.isError) return <ErrorAlert error={resinSystems.error} />;
    if (pigments.isError) return <ErrorAlert error={pigments.error} />;
    if (!resinSystems.data || !pigments.data) return <PageSpinner label="Loading the shelf…" />;
    return (
      <Card className="max-w-3xl">
        <LotForm resinSystems={resinSystems.data.items} pigments={pigments.data.items} busy={create.isPending} save={(values) => create.mutateAsync(values)} />
      </Card>
    );
  };

  return (
    <>
      <DocumentTitle title="Receive a lot" />
      <PageHeader eyebrow="Shelf" title="Receive a lot" description="One container of part A, part B or pigment, as it came in." />
      {body()}
      <p className="mt-6">
        <TextLink to={paths.shelf.getHref({ tab: 'lots' })}>Back to the lots</TextLink>
      </p>
    </>
  );
}
