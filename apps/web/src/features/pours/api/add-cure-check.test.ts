import { CureCheckFields } from '@gelpoint/contracts';
import { describe, expect, it } from 'vitest';
import { cureCheckBody, cureCheckPhotoUrl } from './add-cure-check';

// Reference: the contract the checks route validates its text fields with (packages/contracts pours.ts), read back
// through the WHATWG FormData the browser sends.
describe('cureCheckBody', () => {
  it('sends the fields the API reads, and the photo as the part named photo', async () => {
    const photo = new File([new Uint8Array([0x89, 0x50, 0x4e, 0x47])], 'spot.png', { type: 'image/png' });
    const body = cureCheckBody({ stage: 'tack_free', checkedAt: '2026-03-02T08:00:00.000Z', hardnessShoreD: 62, note: 'firm', photo });
    const text = Object.fromEntries([...body.entries()].filter(([, v]) => typeof v === 'string'));
    expect(CureCheckFields.safeParse(text).success).toBe(true);
    expect(text).toEqual({ stage: 'tack_free', checkedAt: '2026-03-02T08:00:00.000Z', hardnessShoreD: '62', note: 'firm' });
    const part = body.get('photo');
    expect(part instanceof File ? [part.name, part.type, part.size] : null).toEqual(['spot.png', 'image/png', 4]);
  });

  it('leaves out what was not given', () => {
    const body = cureCheckBody({ stage: 'gelled', checkedAt: null, hardnessShoreD: null, note: '', photo: null });
    expect([...body.keys()]).toEqual(['stage']);
  });

  it('points at the photo route of a check', () => {
    expect(cureCheckPhotoUrl('/api/', 'p1', 'c 2')).toBe('/api/pours/p1/checks/c%202/photo');
  });
});
