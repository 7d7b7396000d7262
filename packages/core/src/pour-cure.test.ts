import { describe, expect, it } from 'vitest';
import { buildPourPlan } from './pour-plan';
import { cureState, plannedBatches, planSteps, wantedReminders } from './pour-cure';
import { rectangleCavity } from './quick-shapes';
import { demoDeepPour, demoSealCoat } from './test-fixtures';

const hour = 3_600_000;

function plan(depthMm: number) {
  const cavity = rectangleCavity({ lengthMm: 400, widthMm: 200, depthMm });
  if (!cavity.ok) throw new Error(cavity.error.message);
  const p = buildPourPlan({
    cavity: { curve: cavity.value.curve, wettedAreaMm2: cavity.value.wettedAreaMm2 },
    fillLevelMm: depthMm,
    deepPour: { product: demoDeepPour },
    sealCoat: { product: demoSealCoat, filmThicknessMm: 0.1, coats: 1, absorptionFactor: 1 },
    overPourPct: 0,
    cupWaste: { massG: 0 },
    scaleResolutionG: 1,
    shopTempC: demoDeepPour.referenceTempC,
  });
  if (!p.ok) throw new Error(p.error.message);
  return p.value;
}

describe('the cure clock of a pour', () => {
  it('orders the steps as they are poured: seal coat, then layers from the floor up', () => {
    const p = plan(demoDeepPour.maxLayerMm * 2);
    const steps = planSteps(p, { deepPour: { id: 'd', ...demoDeepPour }, sealCoat: { id: 's', ...demoSealCoat } });
    expect(steps.map((s) => s.key)).toEqual(['seal_coat:1', 'layer:1', 'layer:2']);
    expect(steps.flatMap((s) => s.batches.map((b) => b.index))).toEqual(plannedBatches(p).map((b) => b.index));
  });

  it('runs from the newest step and asks for the next layer, then for demold and machining', () => {
    const p = plan(demoDeepPour.maxLayerMm * 2);
    const steps = planSteps(p, { deepPour: { id: 'd', ...demoDeepPour }, sealCoat: { id: 's', ...demoSealCoat } });
    const now = new Date('2026-11-10T12:00:00Z');
    const pouredAt = new Date(now.getTime() - 2 * hour);
    const afterLayer1 = cureState(steps, [{ step: 'layer:1', mixedAt: pouredAt }], [], demoDeepPour.referenceTempC, now);
    const w1 = wantedReminders(afterLayer1, 'Tray', now, null);
    expect(w1.map((w) => w.kind)).toEqual(['next_layer_window_opens', 'next_layer_window_closes']);
    // At the reference temperature the Arrhenius factor is 1: the data sheet's hours apply as they are.
    expect(w1[0]!.dueAt.getTime()).toBeCloseTo(pouredAt.getTime() + demoDeepPour.recoatWindow.earliestH * hour, -2);
    const afterLayer2 = cureState(
      steps,
      [
        { step: 'layer:1', mixedAt: pouredAt },
        { step: 'layer:2', mixedAt: now },
      ],
      [],
      demoDeepPour.referenceTempC,
      now,
    );
    expect(afterLayer2.isLastStep).toBe(true);
    expect(wantedReminders(afterLayer2, 'Tray', now, null).map((w) => w.kind)).toEqual(['demold_check', 'ready_to_machine']);
  });

  it('schedules the finish coats the set interval apart', () => {
    const now = new Date('2026-11-10T12:00:00Z');
    const w = wantedReminders({ step: null, isLastStep: false, pouredAt: null, status: null }, 'Tray', now, { machinedAt: now, coats: 2, hoursBetween: 8 });
    expect(w.map((x) => [x.step, x.dueAt.toISOString()])).toEqual([
      ['finish:1', '2026-11-10T12:00:00.000Z'],
      ['finish:2', '2026-11-10T20:00:00.000Z'],
    ]);
  });
});
