import { ComingState } from '../../../components/ui/ComingState';
import { DocumentTitle } from '../../../components/ui/DocumentTitle';
import { PageHeader } from '../../../components/ui/PageHeader';

export function Component() {
  return (
    <>
      <DocumentTitle title="Cure board" />
      <PageHeader title="Cure board" description="Every pour in the shop and how far its cure has come." />
      <ComingState
        summary="The cure board will follow each pour from gel to full cure."
        plans={[
          'Gel time, tack-free, recoat window, demold and full cure from the data sheet, corrected for shop temperature',
          'Progress counted from the logged temperatures, so “ready” means the log says so',
          'Reminders when a pour window opens or closes and when a piece can be demolded or machined',
          'Release for machining by the shop lead',
        ]}
      />
    </>
  );
}
