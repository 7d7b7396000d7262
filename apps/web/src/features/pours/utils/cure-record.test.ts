import type { PourView } from '@gelpoint/contracts';
import { describe, expect, it } from 'vitest';
import { pourRecord, temperatureSummary, type PourLog } from './cure-record';
import { runSheetOf } from './plan-run-sheet';
import { testPlan } from './test-plan';

function sheet() {
  const saved = testPlan();
  const read = runSheetOf(saved);
  if (!read.ok) throw new Error(read.error.message);
  return read.value;
}

const person = (name: string) => ({ id: '00000000-0000-4000-8000-0000000000f1', name });

function batch(planBatchIndex: number, step: string, over: Record<string, unknown> = {}) {
  return {
    id: `00000000-0000-4000-8000-0000000001${String(planBatchIndex).padStart(2, '0')}`,
    planBatchIndex,
    step,
    mixedBy: person('Ana Ruiz'),
    mixedAt: `2026-11-02T1${planBatchIndex}:00:00.000Z`,
    lotA: 'A-77',
    lotB: 'B-12',
    lotPigment: '',
    targetAG: 100,
    targetBG: 50,
    targetPigmentG: 0,
    weighedAG: 100.4,
    weighedBG: 49.8,
    weighedPigmentG: 0,
    offRatioPct: 1.2,
    ambientTempC: 21,
    surfaceTempC: 20,
    rhPct: 50,
    dewPointC: 10.2,
    warnings: [],
    notes: '',
    voided: null,
    ...over,
  };
}

// Only the parts of a pour the record reads; the rest of the view is the cure board's.
const pourOf = (parts: Partial<PourLog>): PourLog => ({
  batches: [],
  voidedBatches: [],
  readings: [],
  voidedReadings: [],
  checks: [],
  releasedAt: null,
  releasedBy: null,
  machinedAt: null,
  ...parts,
});

describe('temperatureSummary', () => {
  // Worked by hand from the readings below: lowest 16.5 °C at 02:00, highest 23.1 °C at 14:00, four readings.
  it('finds the lowest and highest reading and when each was taken, in time order whatever the order given', () => {
    const readings = [
      { at: '2026-11-02T14:00:00Z', tempC: 23.1 },
      { at: '2026-11-01T22:00:00Z', tempC: 19 },
      { at: '2026-11-02T02:00:00Z', tempC: 16.5 },
      { at: '2026-11-02T08:00:00-05:00', tempC: 18.2 },
    ];
    expect(temperatureSummary(readings)).toEqual({
      count: 4,
      minC: 16.5,
      minAt: '2026-11-02T02:00:00Z',
      maxC: 23.1,
      maxAt: '2026-11-02T14:00:00Z',
      firstAt: '2026-11-01T22:00:00Z',
      lastAt: '2026-11-02T14:00:00Z',
    });
  });

  it('has nothing to say without readings', () => {
    expect(temperatureSummary([])).toBeNull();
  });
});

describe('pourRecord', () => {
  const plan = sheet();
  const seal = plan.cups.find((c) => c.kind === 'seal_coat')!;
  const layers = plan.cups.filter((c) => c.kind === 'layer');

  it('puts what was logged beside each planned cup, and leaves the cups not yet logged open', () => {
    const record = pourRecord(
      pourOf({
        batches: [
          batch(seal.index, seal.stepKey, { lotA: 'S-A1', lotB: 'S-B1' }),
          batch(layers[0]!.index, layers[0]!.stepKey, { lotPigment: 'P-9', weighedPigmentG: 6.1, mixedBy: person('Sam Lee') }),
        ] as PourView['batches'],
      }),
      plan,
    );
    expect(record.cups).toHaveLength(plan.cups.length);
    expect(record.cups.map((c) => c.order)).toEqual(plan.cups.map((_, i) => i + 1));
    const first = record.cups[seal.order - 1]!;
    expect(first).toMatchObject({
      pourLabel: 'Seal coat 1',
      productName: 'Test Seal 5',
      pigmentName: null,
      targetAG: seal.targetAG,
      logged: { lotA: 'S-A1', lotB: 'S-B1', weighedAG: 100.4, mixedBy: 'Ana Ruiz' },
    });
    const layerCup = record.cups[layers[0]!.order - 1]!;
    expect(layerCup).toMatchObject({
      productName: 'Test Deep 40',
      pigmentName: 'Test Blue',
      logged: { lotPigment: 'P-9', weighedPigmentG: 6.1, mixedBy: 'Sam Lee' },
    });
    expect(record.cups.filter((c) => c.logged === null)).toHaveLength(plan.cups.length - 2);
  });

  it('names every product with the lots drawn from it, each lot once', () => {
    const record = pourRecord(
      pourOf({
        batches: [
          batch(seal.index, seal.stepKey, { lotA: 'S-A1', lotB: 'S-B1' }),
          ...layers.map((c, i) => batch(c.index, c.stepKey, { lotA: i === 0 ? 'A-77' : 'A-78', lotB: 'B-12', lotPigment: 'P-9' })),
        ] as PourView['batches'],
      }),
      plan,
    );
    expect(record.products).toEqual([
      { role: 'Seal coat', name: 'Test Seal 5', lots: ['S-A1', 'S-B1'] },
      { role: 'Deep pour', name: 'Test Deep 40', lots: layers.length > 1 ? ['A-77', 'B-12', 'A-78'] : ['A-77', 'B-12'] },
      { role: 'Pigment', name: 'Test Blue', lots: ['P-9'] },
    ]);
  });

  it('tells the release and the checks in time order', () => {
    const checks = [
      {
        id: '00000000-0000-4000-8000-000000000c02',
        checkedAt: '2026-11-04T09:00:00Z',
        stage: 'machinable' as const,
        hardnessShoreD: 80,
        note: '',
        hasPhoto: false,
        checkedBy: person('Ana Ruiz'),
      },
      {
        id: '00000000-0000-4000-8000-000000000c01',
        checkedAt: '2026-11-03T09:00:00Z',
        stage: 'tack_free' as const,
        hardnessShoreD: null,
        note: 'rim firm',
        hasPhoto: true,
        checkedBy: null,
      },
    ];
    const record = pourRecord(pourOf({ checks, releasedAt: '2026-11-04T10:00:00Z', releasedBy: person('Lee Park') }), plan);
    expect(record.checks.map((c) => c.stage)).toEqual(['tack_free', 'machinable']);
    expect(record.release).toEqual({ by: 'Lee Park', at: '2026-11-04T10:00:00Z' });
    expect(pourRecord(pourOf({}), plan).release).toBeNull();
  });
});
