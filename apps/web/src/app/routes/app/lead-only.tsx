import type { Role } from '@gelpoint/contracts';
import { Alert } from '../../../components/ui/Alert';
import { ButtonLink } from '../../../components/ui/ButtonLink';
import { paths } from '../../../config/paths';
import { roleLabel } from '../../../lib/roles';

/** What someone sees when they open a lead's page without being a lead. */
export function LeadOnlyNotice({ area, role }: { area: string; role: Role }) {
  return (
    <Alert tone="warning" title={`Your role can't open ${area}`} live="none" actions={<ButtonLink to={paths.today.getHref()}>Go to Today</ButtonLink>}>
      {area.charAt(0).toUpperCase() + area.slice(1)} is kept by the shop lead, and you are signed in as {roleLabel(role).toLowerCase()}. Ask your shop lead if
      something here needs changing.
    </Alert>
  );
}
