import { formatDateTime } from '../../../lib/format';
import { useNow } from '../hooks/use-now';
import { relativeWords } from '../utils/relative-time';

/** "in 3 h 20 min", with the date and time itself on hover and for machines. */
export function RelativeTime({ iso }: { iso: string }) {
  const now = useNow(30_000);
  const at = Date.parse(iso);
  if (Number.isNaN(at)) return <span>{iso}</span>;
  const absolute = formatDateTime(iso);
  return (
    <time dateTime={iso} title={absolute}>
      {relativeWords(at, now)}
      <span className="sr-only"> ({absolute})</span>
    </time>
  );
}
