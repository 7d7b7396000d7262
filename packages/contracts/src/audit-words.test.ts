import { describe, expect, it } from 'vitest';
import { auditKinds, auditSentence, auditText } from './audit-words';

const event = (action: string, objectType: string, objectName: string | null, detail: Record<string, unknown> = {}) => ({
  action,
  objectType,
  objectName,
  detail,
});

describe('the audit in words', () => {
  it('names the object and who did it', () => {
    expect(auditText({ ...event('lot.delete', 'lot', 'BRI-A-0412'), actorName: 'Ana Ruiz' })).toBe('Lot BRI-A-0412 deleted by Ana Ruiz');
    expect(auditText({ ...event('piece.create', 'piece', 'Walnut tray'), actorName: 'Sam Lee' })).toBe('Piece Walnut tray created by Sam Lee');
    expect(auditText({ ...event('resin_system.create', 'resin_system', 'Deep 50'), actorName: null })).toBe('Resin system Deep 50 added to the shelf');
    expect(auditText({ ...event('session.open', 'user', 'Ana Ruiz'), actorName: 'Ana Ruiz' })).toBe('Signed in by Ana Ruiz');
  });

  it('keeps the name apart so a page can link it, and counts cups from 1', () => {
    expect(auditSentence(event('batch.log', 'pour', 'Walnut tray', { planBatchIndex: 1 }))).toEqual({
      before: 'Batch 2 logged on the pour of',
      name: 'Walnut tray',
      after: '',
    });
    expect(auditSentence(event('readings.add', 'pour', 'Walnut tray', { added: 1 })).before).toBe('1 temperature reading added to the pour of');
    expect(auditSentence(event('readings.add', 'pour', 'Walnut tray', { added: 24 })).before).toBe('24 temperature readings added to the pour of');
    expect(auditSentence(event('cure_check.add', 'pour', 'Walnut tray', { stage: 'tack_free' })).before).toBe('Cure check (tack-free) recorded on the pour of');
  });

  it('still reads for an action it has no words for, and for an object that is gone without a name', () => {
    expect(auditText({ ...event('batch.void', 'pour', 'Walnut tray'), actorName: 'Ana Ruiz' })).toBe('Batch voided on the pour of Walnut tray by Ana Ruiz');
    expect(auditText({ ...event('mold.reanalyse', 'mold', null), actorName: null })).toBe('Mould reanalyse');
    expect(auditText({ ...event('widget.polish', 'widget', 'W1'), actorName: null })).toBe('Widget W1 polish');
  });

  it('offers each kind once, named in words', () => {
    const kinds = auditKinds.map((k) => k.kind);
    expect(new Set(kinds).size).toBe(kinds.length);
    expect(kinds).toEqual(expect.arrayContaining(['lot', 'piece', 'pour', 'batch', 'session']));
    expect(auditKinds.every((k) => /^[a-z_]+$/.test(k.kind) && k.label.length > 0)).toBe(true);
  });
});
