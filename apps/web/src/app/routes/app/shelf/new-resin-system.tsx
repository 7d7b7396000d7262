import { useNavigate } from 'react-router';
import { Card } from '../../../../components/ui/Card';
import { DocumentTitle } from '../../../../components/ui/DocumentTitle';
import { PageHeader } from '../../../../components/ui/PageHeader';
import { TextLink } from '../../../../components/ui/TextLink';
import { paths } from '../../../../config/paths';
import { useCreateResinSystem } from '../../../../features/shelf/api/create-resin-system';
import { ResinSystemForm } from '../../../../features/shelf/components/ResinSystemForm';
import { mayKeepShelf } from '../../../../features/shelf/utils/shelf-access';
import { LeadOnlyNotice } from '../lead-only';
import { useSignedInSession } from '../../../signed-in-session';

export function Component() {
  const session = useSignedInSession();
  const navigate = useNavigate();
  const create = useCreateResinSystem({ onSuccess: (created) => navigate(paths.resinSystem.getHref(created.id), { replace: true }) });

  return (
    <>
      <DocumentTitle title="New resin system" />
      <PageHeader eyebrow="Shelf" title="New resin system" description="Copy the numbers from the product's technical data sheet (TDS)." />
      {mayKeepShelf(session.role) ? (
        <Card className="max-w-4xl">
          <ResinSystemForm submitLabel="Add to the shelf" busyLabel="Adding…" busy={create.isPending} save={(values) => create.mutateAsync(values)} />
        </Card>
      ) : (
        <LeadOnlyNotice area="the shelf" role={session.role} />
      )}
      <p className="mt-6">
        <TextLink to={paths.shelf.getHref()}>Back to the shelf</TextLink>
      </p>
    </>
  );
}
