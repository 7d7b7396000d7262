import { LogBatchRequest, AddReadingsRequest, CureCheckFields } from '@gelpoint/contracts';
import { describe, expect, it } from 'vitest';
import type { OutboxRequest } from '../../../lib/offline/outbox-entry';
import { applyEdits, editableValues } from './entry-edits';

// Reference: the API's own request contracts (packages/contracts), which the changed entries must still pass.
const batch: OutboxRequest = {
  type: 'json',
  path: '/pours/p/batches',
  body: { planBatchIndex: 0, weighedAG: 200, weighedBG: 100, lotANumber: 'A-1', notes: '' },
};

describe('changing a refused entry', () => {
  it('offers the grams, the notes and the answers to the server’s questions of a cup', () => {
    expect(editableValues({ kind: 'batch', request: batch }).map((v) => v.name)).toEqual([
      'weighedAG',
      'weighedBG',
      'notes',
      'confirmUnusual',
      'acknowledgeExpiredLot',
    ]);
  });

  it('writes the changed grams and answers into a request the API accepts', () => {
    const changed = applyEdits(batch, 'batch', { weighedAG: '201,5', weighedBG: '100', notes: 'reweighed', confirmUnusual: 'true', acknowledgeExpiredLot: '' });
    expect(changed.ok).toBe(true);
    if (!changed.ok || changed.request.type !== 'json') return;
    expect(changed.request.body).toMatchObject({
      weighedAG: 201.5,
      weighedBG: 100,
      notes: 'reweighed',
      confirmUnusual: true,
      acknowledgeExpiredLot: false,
      lotANumber: 'A-1',
    });
    expect(LogBatchRequest.safeParse(changed.request.body).success).toBe(true);
  });

  it('says which value is not a number', () => {
    expect(applyEdits(batch, 'batch', { weighedAG: 'two hundred', weighedBG: '100' })).toEqual({
      ok: false,
      problem: { name: 'weighedAG', message: '“two hundred” is not a number.' },
    });
    // Number('0xC8') is 200 (ECMA-262 hexadecimal literal); a scale never shows one, so it is a slip, not 200 g.
    expect(applyEdits(batch, 'batch', { weighedAG: '0xC8', weighedBG: '100' })).toEqual({
      ok: false,
      problem: { name: 'weighedAG', message: '“0xC8” is not a number.' },
    });
  });

  it('changes a reading’s temperature and a check’s hardness', () => {
    const reading: OutboxRequest = {
      type: 'json',
      path: '/pours/p/readings',
      body: { readings: [{ at: '2026-01-01T10:00:00.000Z', tempC: 70 }], confirmUnusual: false },
    };
    const r = applyEdits(reading, 'reading', { tempC: '21', confirmUnusual: '' });
    expect(r.ok && r.request.type === 'json' ? AddReadingsRequest.safeParse(r.request.body).success : false).toBe(true);
    expect(r.ok && r.request.type === 'json' ? r.request.body.readings : null).toEqual([{ at: '2026-01-01T10:00:00.000Z', tempC: 21 }]);

    const check: OutboxRequest = { type: 'form', path: '/pours/p/checks', fields: { stage: 'gelled', note: 'soft' }, photo: null };
    const c = applyEdits(check, 'check', { hardnessShoreD: '45', note: 'firm' });
    expect(c.ok && c.request.type === 'form' ? c.request.fields : null).toEqual({ stage: 'gelled', note: 'firm', hardnessShoreD: '45' });
    expect(c.ok && c.request.type === 'form' ? CureCheckFields.safeParse(c.request.fields).success : false).toBe(true);
  });
});
