import type { LotView } from '@gelpoint/contracts';
import { describe, expect, it } from 'vitest';
import { lotOptions } from './lot-options';

const lot = (over: Partial<LotView>): LotView => ({
  id: '00000000-0000-4000-8000-000000000001',
  part: 'A',
  resinSystemId: '00000000-0000-4000-8000-0000000000aa',
  pigmentId: null,
  productName: 'Test Deep 40',
  lotNumber: 'A-1',
  quantityG: 4000,
  remainingG: 2500,
  receivedOn: '2026-01-10',
  expiresOn: '2027-01-10',
  notes: '',
  expired: false,
  low: false,
  ...over,
});

describe('lotOptions', () => {
  it('offers lots with stock, in-date ones first, and marks expired ones', () => {
    const options = lotOptions(
      [
        lot({ id: 'old', lotNumber: 'A-OLD', expiresOn: '2025-06-01', expired: true }),
        lot({ id: 'empty', lotNumber: 'A-EMPTY', remainingG: 0 }),
        lot({ id: 'good', lotNumber: 'A-GOOD' }),
      ],
      'metric',
    );
    expect(options.map((o) => o.value)).toEqual(['good', 'old']);
    // 2500 g shows as 2.500 kg (core's formatMass switches to kg at 1000 g).
    expect(options[0]?.label).toBe('A-GOOD · 2.500 kg left · use by 2027-01-10');
    expect(options[1]?.label).toContain('PAST ITS DATE (2025-06-01)');
  });

  it('shows stock in a US shop’s pounds', () => {
    // NIST SP 811: 1 lb = 453.59237 g, so 2500 g = 5.512 lb.
    expect(lotOptions([lot({})], 'us')[0]?.label).toContain('5.512 lb left');
  });
});
