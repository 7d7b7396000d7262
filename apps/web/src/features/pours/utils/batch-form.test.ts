import { LogBatchRequest } from '@gelpoint/contracts';
import { describe, expect, it } from 'vitest';
import { batchFormFields, batchFormSchema, emptyBatchForm, formFieldsOf, liveReadings, logBatchRequest, typedLot } from './batch-form';

const lotId = '3d5b1c7e-2f4a-4b8c-9d0e-1a2b3c4d5e6f';

describe('the mixing form', () => {
  it('turns a filled metric form into a request the API’s own schema accepts', () => {
    const parsed = batchFormSchema('metric').safeParse({
      ...emptyBatchForm,
      lotA: lotId,
      lotB: typedLot,
      lotBNumber: ' B-2291 ',
      weighedA: '212,4',
      weighedB: '106.2',
      ambientTemp: '21',
      surfaceTemp: '20.5',
      rh: '55',
      notes: 'Warmed part A in a water bath.',
    });
    expect(parsed.success).toBe(true);
    if (!parsed.success) return;
    const request = logBatchRequest(parsed.data, 3, new Set([lotId]), '2026-03-01T18:30:00.000Z');
    expect(request).toMatchObject({
      planBatchIndex: 3,
      lotAId: lotId,
      lotANumber: '',
      lotBId: null,
      lotBNumber: 'B-2291',
      weighedAG: 212.4,
      weighedBG: 106.2,
      weighedPigmentG: 0,
      ambientTempC: 21,
      rhPct: 55,
    });
    // Reference: the contract the API validates with (packages/contracts).
    expect(LogBatchRequest.safeParse(request).success).toBe(true);
  });

  it('sends a US shop’s ounces and °F as grams and °C', () => {
    const parsed = batchFormSchema('us').safeParse({ ...emptyBatchForm, weighedA: '8', weighedB: '4', ambientTemp: '68' });
    expect(parsed.success).toBe(true);
    if (!parsed.success) return;
    // NIST SP 811: 1 oz = 28.349523125 g; 68 °F = 20 °C.
    expect(parsed.data.weighedA).toBeCloseTo(8 * 28.349523125, 9);
    expect(parsed.data.weighedB).toBeCloseTo(4 * 28.349523125, 9);
    expect(parsed.data.ambientTemp).toBeCloseTo(20, 9);
  });

  it('asks for both parts and says how to fix each field', () => {
    const parsed = batchFormSchema('metric').safeParse({ ...emptyBatchForm, weighedA: '', weighedB: '0', ambientTemp: 'warm', rh: '140' });
    expect(parsed.success).toBe(false);
    if (parsed.success) return;
    const byField = Object.fromEntries(parsed.error.issues.map((i) => [String(i.path[0]), i.message]));
    expect(byField.weighedA).toMatch(/Enter the weighed part A/);
    expect(byField.weighedB).toMatch(/above zero/);
    expect(byField.ambientTemp).toMatch(/number in °C/);
    expect(byField.rh).toMatch(/0 to 100 %/);
  });

  it('refuses temperatures outside the API’s −30 to 80 °C in the shop’s own unit', () => {
    const parsed = batchFormSchema('us').safeParse({ ...emptyBatchForm, weighedA: '8', weighedB: '4', surfaceTemp: '190' });
    expect(parsed.success).toBe(false);
    if (!parsed.success) expect(parsed.error.issues[0]?.message).toMatch(/°F/);
  });

  it('ignores a lot id that was not offered, and keeps the typed number', () => {
    const parsed = batchFormSchema('metric').parse({ ...emptyBatchForm, lotA: 'made-up', lotANumber: 'A-17', weighedA: '10', weighedB: '5' });
    expect(logBatchRequest(parsed, 0, new Set(), null)).toMatchObject({ lotAId: null, lotANumber: 'A-17' });
    expect('mixedAt' in logBatchRequest(parsed, 0, new Set(), null)).toBe(false);
  });

  it('reads half-typed values for the live warnings', () => {
    expect(liveReadings({ weighedA: '210', weighedB: '', ambientTemp: '68', surfaceTemp: 'x', rh: '50' }, 'us')).toEqual({
      weighedAG: expect.closeTo(210 * 28.349523125, 6),
      weighedBG: null,
      ambientTempC: expect.closeTo(20, 9),
      surfaceTempC: null,
      rhPct: 50,
    });
  });

  it('puts the server’s field messages under the form’s own fields', () => {
    // Every request field the form fills has a form field to carry its message (packages/contracts LogBatchRequest).
    // confirmUnusual is the answer to the log's question, not a field anyone types.
    const requestFields = Object.keys(LogBatchRequest.shape).filter(
      (k) => !['planBatchIndex', 'mixedAt', 'acknowledgeExpiredLot', 'confirmUnusual'].includes(k),
    );
    const mapped = formFieldsOf(Object.fromEntries(requestFields.map((k) => [k, 'bad'])));
    for (const name of Object.keys(mapped)) expect(batchFormFields as readonly string[]).toContain(name);
    expect(formFieldsOf({ weighedBG: 'too light', other: 'x' })).toEqual({ weighedB: 'too light', other: 'x' });
  });
});
