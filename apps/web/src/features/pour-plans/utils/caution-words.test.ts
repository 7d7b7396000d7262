import { caution, handlingCautions } from '@gelpoint/core';
import { describe, expect, it } from 'vitest';
import { cautionsFor, severityWords } from './caution-words';

describe('cautionsFor', () => {
  const cautions = [
    caution('cup_heat_builds_fast', 'warning', 'warm cup', 'batch', 2),
    caution('batch_too_heavy', 'danger', 'heavy cup', 'batch', 2),
    caution('batch_too_heavy', 'danger', 'other cup', 'batch', 3),
    caution('layer_too_thick', 'danger', 'deep pocket', 'layer', 0),
    ...handlingCautions(),
  ];

  it('picks the cautions about one batch, the most serious first', () => {
    expect(cautionsFor(cautions, 'batch', 2).map((c) => c.message)).toEqual(['heavy cup', 'warm cup']);
    expect(cautionsFor(cautions, 'layer', 1)).toEqual([]);
  });

  it('keeps the plan-wide reminders together', () => {
    expect(cautionsFor(cautions, 'plan').map((c) => c.code)).toContain('follow_sds_tds');
    expect(cautionsFor(cautions, 'plan').every((c) => c.appliesTo.kind === 'plan')).toBe(true);
  });

  it('gives every severity its own word', () => {
    expect(new Set(Object.values(severityWords).map((w) => w.label)).size).toBe(3);
  });
});
