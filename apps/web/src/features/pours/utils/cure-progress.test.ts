import { cureStatus, forecastTrack } from '@gelpoint/core';
import { describe, expect, it } from 'vitest';
import type { Cure } from '../types';
import { assumedSpan, nextEvent, progressPercent, stageMarkers } from './cure-progress';
import { cureStageKeys, stageReachedWords, stepWords } from './cure-words';
import { testDeepPour } from './test-plan';

// The cure the API would send, worked out by core for a pour held at 10 °C for 24 h with a 20 °C reference.
function cureAt10CFor24h(): Cure {
  const status = cureStatus({
    product: { ...testDeepPour, referenceTempC: 20, minWorkTempC: 5, activationEnergyKJPerMol: 5000 * 8.314462618e-3 },
    readings: [{ at: '2026-03-01T00:00:00Z', tempC: 10 }],
    pouredAt: '2026-03-01T00:00:00Z',
    asOf: '2026-03-02T00:00:00Z',
    assumedTempC: 10,
  });
  if (!status.ok) throw new Error(status.error.message);
  const s = status.value;
  return {
    step: 'layer:1',
    productName: testDeepPour.name,
    pouredAt: '2026-03-01T00:00:00Z',
    equivalentHoursAtRef: s.age.equivalentHoursAtRef,
    progress: s.progress,
    stageReached: s.stageReached,
    nextLayerWindow: s.nextLayerWindow,
    assumedHours: s.age.assumedHours,
    belowMinimumHours: s.age.belowMinimumHours,
    loggedEquivalentHours: s.age.loggedEquivalentHours,
    assumedEquivalentHours: s.age.assumedEquivalentHours,
    readingCarryH: s.age.readingCarryH,
    gaps: s.age.gaps,
    spans: s.age.spans.map((x) => ({
      from: x.from,
      to: x.to,
      source: x.source,
      tempC: x.tempC,
      startTempC: x.startTempC,
      endTempC: x.endTempC,
      belowMinimum: x.belowMinimum,
    })),
    ahead: forecastTrack(s.ahead, s.stages, Date.parse('2026-03-02T00:00:00Z')).map((p) => ({
      from: new Date(p.fromMs).toISOString(),
      to: new Date(p.toMs).toISOString(),
      tempC: p.tempC,
    })),
    readyToMachine: false,
    release: { allowed: false, reasons: ['Not ready yet.'] },
    stages: s.stages,
    cautions: s.cautions,
  };
}

describe('cure progress on the board', () => {
  it('shows the equivalent age of 24 h at 10 °C as its share of full cure', () => {
    const cure = cureAt10CFor24h();
    // Maturity method of ASTM C1074: 24 h at 10 °C with Q = 5000 K is 13.14 h at 20 °C (Q = Ea/R, R = 8.314462618 J/(mol·K)),
    // i.e. 7.8 % of the invented product's 168 h full cure, shown rounded down as 7 %.
    expect(cure.equivalentHoursAtRef).toBeCloseTo(13.14, 2);
    expect(progressPercent(cure.progress)).toBe(7);
    // Past gel (8 h) and the recoat window's opening (12 h), short of tack-free (16 h).
    expect(stageReachedWords(cure.stageReached)).toBe('Next layer can go on');
  });

  it('never rounds up to 100 % and never leaves 0..100', () => {
    expect(progressPercent(0.999)).toBe(99);
    expect(progressPercent(1)).toBe(100);
    expect(progressPercent(0.29)).toBe(29);
    expect(progressPercent(-0.2)).toBe(0);
    expect(progressPercent(Number.NaN)).toBe(0);
  });

  it('places each milestone on the bar by its data-sheet hours over full cure', () => {
    const markers = stageMarkers(cureAt10CFor24h());
    const byKey = Object.fromEntries(markers.map((m) => [m.key, m]));
    // Invented test product: gel 8 h, demold 48 h, full cure 168 h.
    expect(byKey.gel?.at).toBeCloseTo(8 / 168, 12);
    expect(byKey.demold?.at).toBeCloseTo(48 / 168, 12);
    expect(byKey.full_cure?.at).toBe(1);
    expect(byKey.gel?.reached).toBe(true);
    expect(byKey.demold?.reached).toBe(false);
    expect(byKey.demold?.when).not.toBeNull();
  });

  it('has words for every milestone core knows', () => {
    const keys = cureAt10CFor24h().stages.map((s) => s.key);
    expect([...keys].sort()).toEqual([...cureStageKeys].sort());
  });

  it('takes the next reminder first, and the next predicted stage without one', () => {
    const cure = cureAt10CFor24h();
    const reminder = {
      id: '00000000-0000-4000-8000-000000000001',
      kind: 'demold_check' as const,
      done: null,
      step: 'layer:1',
      dueAt: '2026-03-05T00:00:00Z',
      eventAt: '2026-03-05T00:00:00Z',
      leadMin: 0,
      viaDigest: false,
      status: 'pending' as const,
      assumed: true,
      title: 'Demold check',
      sentAt: null,
    };
    expect(nextEvent(cure, reminder, 'open')).toEqual({ source: 'reminder', title: 'Demold check', at: reminder.dueAt, assumed: true });
    const next = nextEvent(cure, null, 'open');
    expect(next?.source).toBe('stage');
    const firstAhead = cure.stages.filter((s) => !s.reached).sort((p, q) => p.equivalentHoursAtRef - q.equivalentHoursAtRef)[0];
    if (next?.source === 'stage') expect(next.key).toBe(firstAhead?.key);
    expect(nextEvent(cure, null, 'machined')).toBeNull();
  });

  it('words the plan steps, counted from 1', () => {
    expect(stepWords('seal_coat:1')).toBe('Seal coat 1');
    expect(stepWords('layer:2')).toBe('Layer 2');
    expect(stepWords('finish:3')).toBe('Finish coat 3');
    expect(stepWords(null)).toBeNull();
  });

  it('words the assumed stretch, and leaves out less than a minute', () => {
    // 1.5 h = 90 min (ISO 8601 durations: PT1H30M).
    expect(assumedSpan(1.5)).toBe('1 h 30 min');
    expect(assumedSpan(0.01)).toBeNull();
    expect(assumedSpan(0)).toBeNull();
  });
});
