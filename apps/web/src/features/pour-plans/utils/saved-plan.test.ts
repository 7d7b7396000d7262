import { describe, expect, it } from 'vitest';
import { savedTrayPlan } from './plan-fixture';
import { readSavedPlan } from './saved-plan';

describe('readSavedPlan', () => {
  // Reference: core's own buildPourPlan output, after a JSON round trip as the database stores it.
  it('reads back what core computed, unchanged', () => {
    const saved = savedTrayPlan();
    const read = readSavedPlan(saved);
    expect(read.ok).toBe(true);
    if (!read.ok) return;
    expect(read.value.plan).toEqual(saved.result);
    expect(read.value.snapshot.deepPour.name).toBe('Bench Deep 20');
    expect(read.value.input?.fillLevelMm).toBe(30);
  });

  it('says which part it cannot read', () => {
    const saved = savedTrayPlan();
    expect(readSavedPlan({ ...saved, result: { layers: 'two' } })).toMatchObject({ ok: false, error: { code: 'saved_result_unreadable' } });
    expect(readSavedPlan({ ...saved, productSnapshot: {} })).toMatchObject({ ok: false, error: { code: 'saved_snapshot_unreadable' } });
  });

  it('still shows a plan whose stored inputs no longer pass, without offering them to the planner', () => {
    const saved = savedTrayPlan();
    const read = readSavedPlan({ ...saved, inputs: { ...saved.inputs, cavity: { source: 'shape', shape: { kind: 'sketch' } } } });
    expect(read.ok && read.value.input).toBeNull();
    expect(read.ok && read.value.plan).toEqual(saved.result);
  });

  it('never hands the planner a mould level still in the mould’s own frame as a height above the floor', () => {
    const saved = savedTrayPlan();
    const inputs = {
      ...saved.inputs,
      cavity: { source: 'mold', moldId: '5f3c1c2e-0000-4000-8000-000000000003', dam: 'outline' },
      fillLevelMm: 40,
      levelFrom: 'mould',
    };
    const read = readSavedPlan({ ...saved, inputs });
    expect(read.ok && read.value.input).toBeNull();
    expect(read.ok && read.value.levelInMouldFrame).toBe(true);
    const marked = readSavedPlan({ ...saved, inputs: { ...inputs, fillLevelMm: 30, levelFrom: 'floor' } });
    expect(marked.ok && marked.value.input?.fillLevelMm).toBe(30);
    expect(marked.ok && marked.value.levelInMouldFrame).toBe(false);
  });
});
