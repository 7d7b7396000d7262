import { can } from '@gelpoint/contracts';
import { useNavigate } from 'react-router';
import { paths } from '../../../../config/paths';
import { useCreateResinSystem } from '../../../../features/shelf/api/create-resin-system';
import { NewProductPage } from '../../../../features/shelf/components/NewProductPage';
import { ResinSystemForm } from '../../../../features/shelf/components/ResinSystemForm';
import { LeadOnlyNotice } from '../lead-only';
import { useSignedInSession } from '../../../signed-in-session';

export function Component() {
  const session = useSignedInSession();
  const navigate = useNavigate();
  const create = useCreateResinSystem({ onSuccess: (created) => navigate(paths.resinSystem.getHref(created.id), { replace: true }) });

  return (
    <NewProductPage
      title="New resin system"
      description="Copy the numbers from the product's technical data sheet (TDS)."
      mayKeep={can(session.role, 'shelf:keep')}
      notAllowed={<LeadOnlyNotice area="the shelf" role={session.role} />}
      cardClassName="max-w-4xl"
      form={<ResinSystemForm submitLabel="Add to the shelf" busyLabel="Adding…" busy={create.isPending} save={(values) => create.mutateAsync(values)} />}
      backHref={paths.shelf.getHref()}
    />
  );
}
