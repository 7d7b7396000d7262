import { useNavigate } from 'react-router';
import { Card } from '../../../../components/ui/Card';
import { DocumentTitle } from '../../../../components/ui/DocumentTitle';
import { PageHeader } from '../../../../components/ui/PageHeader';
import { TextLink } from '../../../../components/ui/TextLink';
import { paths } from '../../../../config/paths';
import { useCreatePigment } from '../../../../features/shelf/api/create-pigment';
import { PigmentForm } from '../../../../features/shelf/components/PigmentForm';
import { mayKeepShelf } from '../../../../features/shelf/utils/shelf-access';
import { LeadOnlyNotice } from '../lead-only';
import { useSignedInSession } from '../../../signed-in-session';

export function Component() {
  const session = useSignedInSession();
  const navigate = useNavigate();
  const create = useCreatePigment({ onSuccess: (created) => navigate(paths.pigment.getHref(created.id), { replace: true }) });

  return (
    <>
      <DocumentTitle title="New pigment" />
      <PageHeader eyebrow="Shelf" title="New pigment" description="Its loading limits from the maker's data sheet, and what a pack costs." />
      {mayKeepShelf(session.role) ? (
        <Card className="max-w-3xl">
          <PigmentForm submitLabel="Add to the shelf" busyLabel="Adding…" busy={create.isPending} save={(values) => create.mutateAsync(values)} />
        </Card>
      ) : (
        <LeadOnlyNotice area="the shelf" role={session.role} />
      )}
      <p className="mt-6">
        <TextLink to={paths.shelf.getHref({ tab: 'pigments' })}>Back to the shelf</TextLink>
      </p>
    </>
  );
}
