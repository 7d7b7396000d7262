import { describe, expect, it } from 'vitest';
import { moldChanges, rereads, settingsOf } from './mold-changes';

const mold = { name: 'Tray pocket', pieceId: null, units: 'mm' as const, upAxis: 'z' as const };
const pieceId = '5f3c1c2e-0000-4000-8000-000000000002';

describe('moldChanges', () => {
  it('sends nothing for the mould as it is', () => {
    expect(moldChanges(mold, settingsOf(mold))).toEqual({});
  });

  it('sends a trimmed new name, a piece, and null to detach', () => {
    expect(moldChanges(mold, { ...settingsOf(mold), name: '  Tray, left  ', pieceId })).toEqual({ name: 'Tray, left', pieceId });
    expect(moldChanges({ ...mold, pieceId }, settingsOf(mold))).toEqual({ pieceId: null });
  });

  it('reads the file again only for a new unit or up axis', () => {
    const units = moldChanges(mold, { ...settingsOf(mold), units: 'in' });
    expect(units).toEqual({ units: 'in' });
    expect(rereads(units)).toBe(true);
    expect(rereads(moldChanges(mold, { ...settingsOf(mold), upAxis: 'y' }))).toBe(true);
    expect(rereads(moldChanges(mold, { ...settingsOf(mold), name: 'Other' }))).toBe(false);
  });
});
