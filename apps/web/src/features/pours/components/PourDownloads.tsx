import { env } from '../../../config/env';
import { buildUrl } from '../../../lib/api-client';

const linkClass =
  'inline-flex min-h-touch items-center font-semibold text-walnut-700 underline decoration-resin-400 decoration-2 underline-offset-4 hover:text-walnut-900';

/** The pour's log as CSV files: plain links, which the browser downloads with the session cookie. */
export function PourDownloads({ pourId }: { pourId: string }) {
  const id = encodeURIComponent(pourId);
  return (
    <>
      <a href={buildUrl(env.apiBasePath, `/pours/${id}/batches.csv`)} download className={linkClass}>
        Batches as CSV
      </a>
      <a href={buildUrl(env.apiBasePath, `/pours/${id}/readings.csv`)} download className={linkClass}>
        Readings as CSV
      </a>
    </>
  );
}
