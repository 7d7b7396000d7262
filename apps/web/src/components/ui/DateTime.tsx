import { formatDate, formatDateTime } from '../../lib/format';

/** A machine-readable <time> with the date written the way the reader's browser writes dates. */
export function DateTime({ iso, dateOnly = false }: { iso: string; dateOnly?: boolean }) {
  return <time dateTime={iso}>{dateOnly ? formatDate(iso) : formatDateTime(iso)}</time>;
}
