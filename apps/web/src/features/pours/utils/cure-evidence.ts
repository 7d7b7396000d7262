import type { Cure } from '../types';

export interface EvidenceWords {
  /** One sentence: how much of the cure the readings show and how much rests on gaps. */
  basis: string;
  /** More than half of the cure counted without readings near. */
  mostlyAssumed: boolean;
}

const hours = (h: number) => (h >= 10 ? `${h.toFixed(0)} h` : `${h.toFixed(1)} h`);

/** The board's line on what a cure rests on; null before anything is poured. */
export function evidenceWords(
  cure: Pick<Cure, 'pouredAt' | 'equivalentHoursAtRef' | 'loggedEquivalentHours' | 'assumedEquivalentHours' | 'gaps'>,
): EvidenceWords | null {
  if (cure.pouredAt === null) return null;
  const total = cure.equivalentHoursAtRef;
  if (!(total > 0)) return { basis: 'No cure counted yet.', mostlyAssumed: false };
  const assumedShare = cure.assumedEquivalentHours / total;
  const gaps = cure.gaps.length;
  if (cure.loggedEquivalentHours <= 0) {
    return { basis: `All ${hours(total)} of this cure rest on the plan's shop temperature: nothing has been logged.`, mostlyAssumed: true };
  }
  const logged = `${hours(cure.loggedEquivalentHours)} of ${hours(total)} logged`;
  if (cure.assumedEquivalentHours < 0.05) return { basis: `Cure: ${logged}, all of it from readings.`, mostlyAssumed: false };
  const gapWords = gaps > 0 ? ` across ${gaps} gap${gaps === 1 ? '' : 's'} in the log` : '';
  return {
    basis: `Cure: ${logged}; ${hours(cure.assumedEquivalentHours)} counted${gapWords} at the lower temperature.`,
    mostlyAssumed: assumedShare > 0.5,
  };
}
