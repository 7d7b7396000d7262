import { ComingState } from '../../../components/ui/ComingState';
import { DocumentTitle } from '../../../components/ui/DocumentTitle';
import { PageHeader } from '../../../components/ui/PageHeader';

export function Component() {
  return (
    <>
      <DocumentTitle title="Shelf" />
      <PageHeader title="Shelf" description="The resin systems, pigments and lots the shop keeps." />
      <ComingState
        summary="The shelf will hold what the shop pours with, and trace it into every piece."
        plans={[
          'Resin systems with mix ratio, densities, pot life, and layer and batch limits from the TDS',
          'Pigments with their maximum loading',
          'Lots with expiry dates, and stock that each batch draws down',
          'Which lots went into which piece, and who mixed them',
        ]}
      />
    </>
  );
}
