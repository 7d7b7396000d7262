import { Alert } from '../../../components/ui/Alert';
import { Button } from '../../../components/ui/Button';
import { FormAlert } from '../../../components/ui/FormAlert';
import { errorNotice } from '../../../lib/error-notice';
import { useIssueIngestToken } from '../api/issue-ingest-token';

/** A shop thermometer posts its readings with a token of its own; it is shown once, then only its hash is kept. */
export function ThermometerToken() {
  const issue = useIssueIngestToken();
  const token = issue.data?.token;
  return (
    <section aria-labelledby="thermometer-heading" className="flex flex-col gap-4">
      <h2 id="thermometer-heading" className="text-xl font-semibold">
        Shop thermometer
      </h2>
      <p>
        A thermometer or logger can send its readings to a pour by itself: it posts them to <code>/api/ingest/readings</code> with this token in the{' '}
        <code>X-Gelpoint-Ingest-Token</code> header. Issuing a new token stops the old one.
      </p>
      {issue.error ? <FormAlert title="Could not issue a token" message={errorNotice(issue.error).message} /> : null}
      {token ? (
        <Alert tone="success">
          <p className="mb-2">Copy it now: it is shown only this once.</p>
          <code className="block break-all rounded bg-white px-3 py-2 text-base" aria-label="Thermometer token">
            {token}
          </code>
        </Alert>
      ) : null}
      <div>
        <Button variant="secondary" onClick={() => issue.mutate()} busy={issue.isPending} busyLabel="Issuing…">
          {token ? 'Issue another token' : 'Issue a thermometer token'}
        </Button>
      </div>
    </section>
  );
}
