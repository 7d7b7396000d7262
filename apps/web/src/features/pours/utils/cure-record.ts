import type { PourView } from '@gelpoint/contracts';
import { parseIsoInstant } from '@gelpoint/core';
import type { RunSheet } from './plan-run-sheet';

type Batch = PourView['batches'][number];

/** What of a pour its record is told from: the log (cups, readings, checks) and its release. */
export type PourLog = Pick<PourView, 'batches' | 'voidedBatches' | 'readings' | 'voidedReadings' | 'checks' | 'releasedAt' | 'releasedBy' | 'machinedAt'>;

/** One cup of the plan as the record shows it: what the plan asked for, and what was logged for it, if anything. */
export interface RecordCup {
  order: number;
  pourLabel: string;
  productName: string;
  pigmentName: string | null;
  targetAG: number;
  targetBG: number;
  targetPigmentG: number;
  /** Null while the cup is not logged. */
  logged: {
    lotA: string;
    lotB: string;
    lotPigment: string;
    weighedAG: number;
    weighedBG: number;
    weighedPigmentG: number;
    offRatioPct: number;
    mixedBy: string | null;
    mixedAt: string;
    ambientTempC: number | null;
    rhPct: number | null;
    warnings: string[];
    voided: boolean;
  } | null;
}

export interface TemperatureSummary {
  count: number;
  minC: number;
  minAt: string;
  maxC: number;
  maxAt: string;
  firstAt: string;
  lastAt: string;
}

export interface ProductUse {
  role: 'Deep pour' | 'Seal coat' | 'Pigment';
  name: string;
  lots: string[];
}

export interface PourRecord {
  cups: RecordCup[];
  products: ProductUse[];
  temperatures: TemperatureSummary | null;
  checks: PourView['checks'];
  release: { by: string | null; at: string } | null;
  machinedAt: string | null;
}

// A voided batch (one logged by mistake) stays on the record, marked, and counts for nothing.
const isVoided = (b: Batch) => b.voided !== null;

const instantMs = (iso: string) => {
  const parsed = parseIsoInstant(iso);
  return parsed.ok ? parsed.value : Number.NaN;
};

/** Lowest and highest of the logged temperatures, with when each was read, and the span of the log. */
export function temperatureSummary(readings: readonly { at: string; tempC: number }[]): TemperatureSummary | null {
  const usable = readings.filter((r) => Number.isFinite(r.tempC) && Number.isFinite(instantMs(r.at))).sort((p, q) => instantMs(p.at) - instantMs(q.at));
  const first = usable[0];
  const last = usable.at(-1);
  if (!first || !last) return null;
  let min = first;
  let max = first;
  for (const r of usable) {
    if (r.tempC < min.tempC) min = r;
    if (r.tempC > max.tempC) max = r;
  }
  return { count: usable.length, minC: min.tempC, minAt: min.at, maxC: max.tempC, maxAt: max.at, firstAt: first.at, lastAt: last.at };
}

const distinct = (values: string[]) => [...new Set(values.filter((v) => v.trim() !== ''))];

/**
 * A pour as its cure record tells it: each planned cup with the lots, grams, person and time logged for it, the
 * products and every lot number drawn from each, the temperatures in brief, the cure checks and the release.
 */
export function pourRecord(pour: PourLog, sheet: RunSheet): PourRecord {
  const byIndex = new Map<number, Batch>();
  for (const b of [...pour.batches, ...pour.voidedBatches]) {
    const held = byIndex.get(b.planBatchIndex);
    // Should a cup have been logged again after a voided try, the record shows the try that counts.
    if (!held || (isVoided(held) && !isVoided(b))) byIndex.set(b.planBatchIndex, b);
  }
  const cups: RecordCup[] = sheet.cups.map((cup) => {
    const b = byIndex.get(cup.index);
    return {
      order: cup.order,
      pourLabel: cup.pourLabel,
      productName: cup.product.name,
      pigmentName: cup.pigment?.name ?? null,
      targetAG: cup.targetAG,
      targetBG: cup.targetBG,
      targetPigmentG: cup.targetPigmentG,
      logged: b
        ? {
            lotA: b.lotA,
            lotB: b.lotB,
            lotPigment: b.lotPigment,
            weighedAG: b.weighedAG,
            weighedBG: b.weighedBG,
            weighedPigmentG: b.weighedPigmentG,
            offRatioPct: b.offRatioPct,
            mixedBy: b.mixedBy?.name ?? null,
            mixedAt: b.mixedAt,
            ambientTempC: b.ambientTempC,
            rhPct: b.rhPct,
            warnings: b.warnings.map((w) => w.message),
            voided: isVoided(b),
          }
        : null,
    };
  });
  const counted = cups.filter((c) => c.logged && !c.logged.voided);
  const sealCups = counted.filter((c) => c.pourLabel.startsWith('Seal'));
  const layerCups = counted.filter((c) => !c.pourLabel.startsWith('Seal'));
  const products: ProductUse[] = [
    ...(sheet.sealCoat
      ? [{ role: 'Seal coat' as const, name: sheet.sealCoat.name, lots: distinct(sealCups.flatMap((c) => [c.logged!.lotA, c.logged!.lotB])) }]
      : []),
    { role: 'Deep pour', name: sheet.deepPour.name, lots: distinct(layerCups.flatMap((c) => [c.logged!.lotA, c.logged!.lotB])) },
  ];
  const pigmentName = sheet.cups.find((c) => c.pigment)?.pigment?.name;
  if (pigmentName) products.push({ role: 'Pigment', name: pigmentName, lots: distinct(counted.map((c) => c.logged!.lotPigment)) });
  return {
    cups,
    products,
    temperatures: temperatureSummary(pour.readings),
    checks: [...pour.checks].sort((p, q) => instantMs(p.checkedAt) - instantMs(q.checkedAt)),
    release: pour.releasedAt ? { by: pour.releasedBy?.name ?? null, at: pour.releasedAt } : null,
    machinedAt: pour.machinedAt,
  };
}
