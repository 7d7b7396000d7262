import { env } from '../../../config/env';
import { DateTime } from '../../../components/ui/DateTime';
import { cureCheckPhotoUrl } from '../api/add-cure-check';
import type { CureCheck } from '../types';
import { checkStageWords } from '../utils/cure-words';

/** Every check of the surface, newest first, with its photo as a thumbnail that opens full size. */
export function CureChecksList({ pourId, checks }: { pourId: string; checks: readonly CureCheck[] }) {
  if (checks.length === 0) return <p className="text-ink-soft">No cure checks yet. Press a test spot at the edge, not the show face.</p>;
  const newestFirst = [...checks].sort((p, q) => Date.parse(q.checkedAt) - Date.parse(p.checkedAt));
  return (
    <ul className="flex flex-col gap-3" aria-label="Cure checks">
      {newestFirst.map((check) => {
        const photo = check.hasPhoto ? cureCheckPhotoUrl(env.apiBasePath, pourId, check.id) : null;
        return (
          <li key={check.id} className="flex gap-4 rounded-lg border border-line bg-white p-3">
            {photo ? (
              <a href={photo} target="_blank" rel="noopener" className="shrink-0">
                <img
                  src={photo}
                  alt={`Cure check photo: ${checkStageWords[check.stage].toLowerCase()}`}
                  loading="lazy"
                  className="size-20 rounded-md border border-line object-cover"
                />
              </a>
            ) : null}
            <div className="flex min-w-0 flex-col gap-0.5">
              <p className="font-bold text-walnut-900">{checkStageWords[check.stage]}</p>
              <p className="text-sm text-ink-soft">
                <DateTime iso={check.checkedAt} /> · {check.checkedBy?.name ?? 'a former member'}
                {check.hardnessShoreD !== null ? ` · Shore D ${check.hardnessShoreD}` : ''}
              </p>
              {check.note ? <p className="whitespace-pre-line">{check.note}</p> : null}
            </div>
          </li>
        );
      })}
    </ul>
  );
}
