import { isRouteErrorResponse, useRevalidator, useRouteError } from 'react-router';
import { Alert } from '../../../components/ui/Alert';
import { Button } from '../../../components/ui/Button';
import { ButtonLink } from '../../../components/ui/ButtonLink';
import { DocumentTitle } from '../../../components/ui/DocumentTitle';
import { PageHeader } from '../../../components/ui/PageHeader';
import { paths } from '../../../config/paths';
import { hasStatus } from '../../../lib/api-error';
import { errorNotice } from '../../../lib/error-notice';

/** A page inside the frame that failed to load; the header and menu stay so the person can go elsewhere. */
export function Component() {
  const error = useRouteError();
  const revalidator = useRevalidator();

  if ((isRouteErrorResponse(error) && error.status === 404) || hasStatus(error, 404)) {
    return (
      <>
        <DocumentTitle title="Not found" />
        <PageHeader title="Not found" />
        <Alert tone="warning" live="none" actions={<ButtonLink to={paths.today.getHref()}>Go to Today</ButtonLink>}>
          There is nothing at this address. It may have been deleted, or the link may be wrong.
        </Alert>
      </>
    );
  }

  if (hasStatus(error, 401)) {
    return (
      <>
        <DocumentTitle title="Signed out" />
        <PageHeader title="Your session ended" />
        <Alert tone="info">Taking you to sign in; you come back here afterwards.</Alert>
      </>
    );
  }

  const notice = errorNotice(error);
  return (
    <>
      <DocumentTitle title={notice.title} />
      <PageHeader title={notice.title} />
      <Alert
        tone={hasStatus(error, 403) ? 'warning' : 'error'}
        actions={
          hasStatus(error, 403) ? (
            <ButtonLink to={paths.today.getHref()}>Go to Today</ButtonLink>
          ) : (
            <Button onClick={() => void revalidator.revalidate()} busy={revalidator.state === 'loading'}>
              Try again
            </Button>
          )
        }
      >
        {notice.message}
      </Alert>
    </>
  );
}
