import type { Cure } from '../types';
import { evidenceWords } from '../utils/cure-evidence';

/**
 * What a pour's cure rests on: how much the readings show and how much was counted on gaps in the log; and, once
 * the cure is far enough along, what still stands in the way of release.
 */
export function CureEvidence({ cure, open }: { cure: Cure; open: boolean }) {
  const words = evidenceWords(cure);
  if (!words) return null;
  return (
    <div className="flex flex-col gap-1 text-sm">
      <p className={words.mostlyAssumed ? 'font-semibold text-ember-700' : 'text-ink-soft'}>{words.basis}</p>
      {open && cure.readyToMachine && !cure.release.allowed ? (
        <div className="rounded-lg border border-resin-500 bg-resin-50 p-3 text-resin-700">
          <p className="font-semibold">Not yet released for machining:</p>
          <ul className="list-disc pl-5">
            {cure.release.reasons.map((reason) => (
              <li key={reason}>{reason}</li>
            ))}
          </ul>
        </div>
      ) : null}
    </div>
  );
}
