import { absorptionPresets } from '@gelpoint/core';
import { describe, expect, it } from 'vitest';
import { absorptionOptions, moldChoices, pigmentOptions, productOptions } from './planner-options';
import { benchDeep, benchSeal, benchTeal } from './test-fixtures';

describe('planner options', () => {
  it('offers the shelf, and an archived product only while the plan still names it', () => {
    const archived = { ...benchSeal, archived: true };
    expect(productOptions([benchDeep, archived], '', 'metric').map((o) => o.value)).toEqual([benchDeep.id]);
    const kept = productOptions([benchDeep, archived], archived.id, 'metric');
    expect(kept.map((o) => o.value)).toEqual([benchDeep.id, archived.id]);
    expect(kept[1]?.label).toContain('archived');
    expect(kept[0]?.label).toBe('Bench Deep 20 (deep pour, layers up to 20.0 mm)');
    expect(pigmentOptions([{ ...benchTeal, archived: true }], '')).toEqual([]);
  });

  // NIST SP 811: 20 mm is 20 / 25.4 = 0.787 in.
  it('writes a product’s layer limit in the shop’s units', () => {
    expect(productOptions([benchDeep], '', 'us')[0]?.label).toContain('0.787 in');
  });

  it('offers every absorption preset core knows, with its factor, and the shop’s own', () => {
    expect(absorptionOptions.map((o) => o.value)).toEqual([...Object.keys(absorptionPresets), 'custom']);
    expect(absorptionOptions.find((o) => o.value === 'end_grain')?.label).toContain('× 2.00');
  });
});

describe('moldChoices', () => {
  const pieceId = 'piece-1';
  const summary = (id: string, name: string, status: 'ready' | 'queued' = 'ready') => ({
    id,
    name,
    fileName: `${name}.stl`,
    format: 'stl' as const,
    units: 'mm' as const,
    fileUnits: null,
    upAxis: 'z' as const,
    sizeBytes: 1,
    sha256: 'x',
    pieceId,
    status,
    progress: 1,
    error: null,
    createdAt: '2026-11-01T10:00:00.000Z',
    analysedAt: null,
    fillVolumeToTopMm3: null,
  });

  it('offers the piece’s measured moulds, and keeps the plan’s own in view when it is among them', () => {
    const list = [summary('m-1', 'Left pocket'), summary('m-2', 'Right pocket', 'queued')];
    expect(moldChoices(list, 'm-1', { state: 'loading' }, pieceId)).toEqual([{ value: 'm-1', label: 'Left pocket' }]);
  });

  it('shows the plan’s mould that the piece no longer lists, or says it is gone', () => {
    const list = [summary('m-1', 'Left pocket')];
    const moved = moldChoices(
      list,
      'm-9',
      { state: 'found', mold: { id: 'm-9', name: 'Bowl blank', fileName: 'b.stl', status: 'queued', pieceId: 'other' } },
      pieceId,
    );
    expect(moved.at(-1)).toEqual({ value: 'm-9', label: 'Bowl blank (being measured, of another piece)' });
    expect(moldChoices(list, 'm-9', { state: 'gone' }, pieceId).at(-1)).toEqual({ value: 'm-9', label: 'No longer in the shop – choose another' });
    expect(moldChoices(list, '', { state: 'gone' }, pieceId)).toHaveLength(1);
  });
});
