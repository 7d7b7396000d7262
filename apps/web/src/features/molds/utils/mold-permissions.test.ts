import { roles } from '@gelpoint/contracts';
import { describe, expect, it } from 'vitest';
import { mayChangeMolds } from './mold-permissions';

// Reference: the API contract's access note for the mould routes, "DELETE /api/molds/:id (lead, maker)".
describe('mayChangeMolds', () => {
  it('lets the lead and makers upload and delete, and keeps apprentices to reading', () => {
    expect(roles.filter(mayChangeMolds)).toEqual(['lead', 'maker']);
  });
});
