import { formatIsoInstant } from './iso-time';
import type { CureState } from './pour-cure';
import { readyToMachineHOf } from './shelf';

export interface ReleaseCheck {
  checkedAt: Date;
  hardnessShoreD: number | null;
}

export interface ReleaseEvidence {
  allowed: boolean;
  /** What still stands in the way, one sentence each; empty when allowed. */
  reasons: string[];
}

function hours(h: number): string {
  return h >= 10 ? `${h.toFixed(0)} h` : `${h.toFixed(1)} h`;
}

/**
 * Whether the log shows a piece ready to machine. The cure must reach the data sheet's point on
 * the logged history (gaps counted at their conservative temperature), some of it must rest on
 * readings, and when the data sheet states a hardness, a cure check must have measured it.
 */
export function releaseEvidence(state: CureState, checks: ReleaseCheck[]): ReleaseEvidence {
  const reasons: string[] = [];
  const { step, status } = state;
  if (!step || !status || !state.pouredAt) return { allowed: false, reasons: ['Nothing has been poured yet.'] };
  if (!state.isLastStep) reasons.push('Not every layer of the plan is poured yet.');
  const product = step.product;
  const needed = readyToMachineHOf(product);
  const age = status.age;
  if (age.loggedEquivalentHours <= 0) {
    reasons.push(
      'No temperature has been logged since the last layer was poured: log readings (by hand, from a file or a shop thermometer) so the cure rests on what happened.',
    );
  }
  const ready = status.stages.find((s) => s.key === 'ready_to_machine');
  if (age.equivalentHoursAtRef < needed) {
    const when = ready?.predictedAt ? ` At the latest readings it gets there around ${ready.predictedAt}.` : '';
    reasons.push(
      `The logged cure has reached ${hours(age.equivalentHoursAtRef)} of the ${hours(needed)} at ${product.referenceTempC} °C the data sheet gives for machining (${hours(age.assumedEquivalentHours)} of it counted on gaps in the log at their lower temperature).${when}`,
    );
  }
  if (product.hardnessShoreD !== undefined) {
    const since = state.pouredAt.getTime();
    const best = checks
      .filter((c) => c.checkedAt.getTime() >= since && c.hardnessShoreD !== null)
      .reduce<number | null>((m, c) => Math.max(m ?? -Infinity, c.hardnessShoreD!), null);
    if (best === null || best < product.hardnessShoreD) {
      reasons.push(
        best === null
          ? `The data sheet gives a cured hardness of Shore D ${product.hardnessShoreD}: log a cure check with a Shore D reading of at least that, taken after ${formatIsoInstant(since)}.`
          : `The hardest cure check since the last layer read Shore D ${best}, under the data sheet's ${product.hardnessShoreD}: let it cure longer and check again.`,
      );
    }
  }
  return { allowed: reasons.length === 0, reasons };
}
