import { DocumentTitle } from '../../components/ui/DocumentTitle';
import { ButtonLink } from '../../components/ui/ButtonLink';
import { PublicLayout } from '../../components/layouts/PublicLayout';
import { paths } from '../../config/paths';

export function Component() {
  return (
    <PublicLayout>
      <DocumentTitle title="No such page" />
      <div className="flex flex-col gap-5">
        <h1 className="text-3xl font-bold text-walnut-900">No such page</h1>
        <p className="text-lg text-ink-soft">The address does not lead anywhere in Gelpoint. It may be mistyped, or the page may have moved.</p>
        <div className="flex flex-wrap gap-2">
          <ButtonLink to={paths.today.getHref()}>Go to Today</ButtonLink>
          <ButtonLink variant="secondary" to={paths.signIn.getHref()}>
            Sign in
          </ButtonLink>
        </div>
      </div>
    </PublicLayout>
  );
}
