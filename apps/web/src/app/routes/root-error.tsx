import { isRouteErrorResponse, useRouteError } from 'react-router';
import { Button } from '../../components/ui/Button';
import { DocumentTitle } from '../../components/ui/DocumentTitle';
import { ErrorAlert } from '../../components/ui/ErrorAlert';
import { PublicLayout } from '../../components/layouts/PublicLayout';

/** The last safety net: something failed before any page could draw. */
export function RootErrorPage() {
  const error = useRouteError();
  const notFound = isRouteErrorResponse(error) && error.status === 404;
  return (
    <PublicLayout>
      <DocumentTitle title={notFound ? 'No such page' : 'Something went wrong'} />
      <div className="flex flex-col gap-5">
        <h1 className="text-3xl font-bold text-walnut-900">{notFound ? 'No such page' : 'Gelpoint could not open'}</h1>
        {notFound ? <p className="text-lg text-ink-soft">The address does not lead to a page. Check it, or start from Today.</p> : <ErrorAlert error={error} />}
        <div>
          <Button onClick={() => window.location.reload()}>Try again</Button>
        </div>
      </div>
    </PublicLayout>
  );
}
