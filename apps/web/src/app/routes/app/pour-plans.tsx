import { ComingState } from '../../../components/ui/ComingState';
import { DocumentTitle } from '../../../components/ui/DocumentTitle';
import { PageHeader } from '../../../components/ui/PageHeader';

export function Component() {
  return (
    <>
      <DocumentTitle title="Pour plans" />
      <PageHeader title="Pour plans" description="What goes into every cup, layer by layer." />
      <ComingState
        summary="Pour plans will work out the resin for a piece, from seal coat to the last layer."
        plans={[
          'Seal coat from the wetted area, film thickness, number of coats and what the wood soaks up',
          'Deep pours split into layers no thicker than the product allows',
          'Batches no heavier than its exotherm limit, with part A and part B by weight or by volume',
          'Pigment as a share of resin mass, kept under the pigment’s own maximum',
          'Over-pour and cup-waste margins, and what the materials cost',
          'Printable run sheets and batch labels',
        ]}
      />
    </>
  );
}
