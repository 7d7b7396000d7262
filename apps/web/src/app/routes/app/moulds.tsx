import { ComingState } from '../../../components/ui/ComingState';
import { DocumentTitle } from '../../../components/ui/DocumentTitle';
import { PageHeader } from '../../../components/ui/PageHeader';

export function Component() {
  return (
    <>
      <DocumentTitle title="Moulds" />
      <PageHeader title="Moulds" description="The cavities your pieces are cast into." />
      <ComingState
        summary="Moulds will turn the STL of a cavity into a cavity report."
        plans={[
          'Upload a binary or ASCII STL in mm, cm or inches, and choose which way is up',
          'Checks that the mesh is watertight and faces the right way',
          'Fill volume up to any level, and how the volume grows with the level',
          'Wetted area for the seal coat, the deepest point, and a map of resin depth',
          'Pockets under overhangs where air could stay trapped',
          'Quick shapes without CAD: rectangle or channel, cylinder, or area × average depth',
        ]}
      />
    </>
  );
}
