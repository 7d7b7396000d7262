import { ComingState } from '../../../components/ui/ComingState';
import { DocumentTitle } from '../../../components/ui/DocumentTitle';
import { PageHeader } from '../../../components/ui/PageHeader';
import { SafetyNote } from '../../../components/ui/SafetyNote';
import { useSignedInSession } from '../../signed-in-session';

export function Component() {
  const session = useSignedInSession();
  return (
    <>
      <DocumentTitle title="Today" />
      <PageHeader title="Today" eyebrow={session.shop.name} description={`Good to see you, ${session.user.name}.`} />
      <div className="flex flex-col gap-6">
        <ComingState
          summary="Today will gather what needs hands in the shop right now."
          plans={[
            'Seal coats turning tacky and pour windows opening and closing',
            'The next layer due, demold checks, and pieces ready for machining',
            'Batches waiting to be mixed, each with its run sheet',
            'A dew-point check against the shop’s temperature and humidity, before amine blush or condensation can form',
          ]}
        />
        <SafetyNote />
      </div>
    </>
  );
}
