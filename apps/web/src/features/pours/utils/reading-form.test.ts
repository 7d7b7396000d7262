import { AddReadingsRequest, CureCheckFields } from '@gelpoint/contracts';
import { describe, expect, it } from 'vitest';
import { cureCheckFormSchema, cureCheckStages, readingFormSchema } from './reading-form';

// Reference: the contracts the API validates with (packages/contracts pours.ts).
describe('reading and cure-check forms', () => {
  it('sends a typed reading as the API takes it', () => {
    const parsed = readingFormSchema('metric').parse({ at: '2026-03-01T21:15', temp: '18,5' });
    // Before a shop is known, the time typed is read in the browser's own zone.
    expect(Date.parse(parsed.at)).toBe(new Date(2026, 2, 1, 21, 15).getTime());
    expect(parsed.temp).toBe(18.5);
    expect(AddReadingsRequest.safeParse({ readings: [{ at: parsed.at, tempC: parsed.temp }] }).success).toBe(true);
  });

  it('reads °F in a US shop', () => {
    // NIST SP 811: 59 °F = 15 °C.
    expect(readingFormSchema('us').parse({ at: '2026-03-01T21:15', temp: '59' }).temp).toBeCloseTo(15, 9);
  });

  it('refuses a missing time or an unreadable temperature with a sentence', () => {
    const parsed = readingFormSchema('metric').safeParse({ at: '', temp: 'cold' });
    expect(parsed.success).toBe(false);
    if (!parsed.success) expect(parsed.error.issues.map((i) => i.path[0])).toEqual(['at', 'temp']);
  });

  it('offers exactly the stages the API knows and sends what it accepts', () => {
    expect([...cureCheckStages]).toEqual(CureCheckFields.shape.stage.options);
    const parsed = cureCheckFormSchema.parse({ stage: 'tack_free', checkedAt: '2026-03-02T08:00', hardness: '62', note: ' firm at the edge ' });
    expect(parsed).toMatchObject({ stage: 'tack_free', hardness: 62, note: 'firm at the edge' });
    expect(
      CureCheckFields.safeParse({ stage: parsed.stage, checkedAt: parsed.checkedAt, hardnessShoreD: String(parsed.hardness), note: parsed.note }).success,
    ).toBe(true);
  });

  it('holds Shore D to 0–100', () => {
    expect(cureCheckFormSchema.safeParse({ stage: 'gelled', checkedAt: '2026-03-02T08:00', hardness: '120', note: '' }).success).toBe(false);
    expect(cureCheckFormSchema.parse({ stage: 'gelled', checkedAt: '2026-03-02T08:00', hardness: '', note: '' }).hardness).toBeNull();
  });
});
