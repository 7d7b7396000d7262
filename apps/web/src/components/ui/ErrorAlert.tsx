import { errorNotice } from '../../lib/error-notice';
import { Alert } from './Alert';

/** A failed request, said in words a person can act on. */
export function ErrorAlert({ error, live = 'alert' }: { error: unknown; live?: 'alert' | 'none' }) {
  const notice = errorNotice(error);
  return (
    <Alert tone="error" title={notice.title} live={live}>
      {notice.message}
    </Alert>
  );
}
