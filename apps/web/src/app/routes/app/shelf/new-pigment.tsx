import { can } from '@gelpoint/contracts';
import { useNavigate } from 'react-router';
import { paths } from '../../../../config/paths';
import { useCreatePigment } from '../../../../features/shelf/api/create-pigment';
import { NewProductPage } from '../../../../features/shelf/components/NewProductPage';
import { PigmentForm } from '../../../../features/shelf/components/PigmentForm';
import { LeadOnlyNotice } from '../lead-only';
import { useSignedInSession } from '../../../signed-in-session';

export function Component() {
  const session = useSignedInSession();
  const navigate = useNavigate();
  const create = useCreatePigment({ onSuccess: (created) => navigate(paths.pigment.getHref(created.id), { replace: true }) });

  return (
    <NewProductPage
      title="New pigment"
      description="Its loading limits from the maker's data sheet, and what a pack costs."
      mayKeep={can(session.role, 'shelf:keep')}
      notAllowed={<LeadOnlyNotice area="the shelf" role={session.role} />}
      cardClassName="max-w-3xl"
      form={<PigmentForm submitLabel="Add to the shelf" busyLabel="Adding…" busy={create.isPending} save={(values) => create.mutateAsync(values)} />}
      backHref={paths.shelf.getHref({ tab: 'pigments' })}
    />
  );
}
