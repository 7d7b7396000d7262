import { describe, expect, it } from 'vitest';
import { comparableValues, clearDraft, draftStorageKey, parseDraft, readDraft, serializeDraft, writeDraft, type PlannerDraft } from './planner-draft';
import { newPlannerValues } from './planner-values';

/** A Storage that keeps its entries in a map, as the browser's localStorage keeps them per origin. */
function memoryStorage() {
  const entries = new Map<string, string>();
  return {
    entries,
    getItem: (k: string) => entries.get(k) ?? null,
    setItem: (k: string, v: string) => void entries.set(k, v),
    removeItem: (k: string) => void entries.delete(k),
  };
}

const place = { pieceId: 'p-1', planId: null };
const draftOf = (over: Partial<PlannerDraft> = {}): PlannerDraft => {
  const values = newPlannerValues('Tray, first pour');
  values.fillLevelMm = 24.5;
  values.cavity.source = 'mold';
  values.cavity.moldId = 'm-1';
  return { version: 1, unitSystem: 'metric', basedOn: null, savedAt: '2026-11-01T10:00:00.000Z', values, ...over };
};

describe('planner drafts', () => {
  it('keeps empty number boxes empty across the round trip, not the text "NaN" or zero', () => {
    const back = parseDraft(serializeDraft(draftOf()));
    expect(back?.values.fillLevelMm).toBe(24.5);
    expect(back?.values.shopTempC).toBeNaN();
    expect(back?.values.cavity.shape.maxDepthMm).toBeNull();
    expect(back?.values.cavity.moldId).toBe('m-1');
  });

  it('comes back for the same piece and plan, units and saved version only', () => {
    const storage = memoryStorage();
    writeDraft(storage, place, draftOf());
    expect(readDraft(storage, place, { unitSystem: 'metric', basedOn: null })?.values.name).toBe('Tray, first pour');
    expect(readDraft(storage, { pieceId: 'p-2', planId: null }, { unitSystem: 'metric', basedOn: null })).toBeNull();
    expect(readDraft(storage, place, { unitSystem: 'us', basedOn: null })).toBeNull();
    const edit = { pieceId: 'p-1', planId: 'plan-9' };
    writeDraft(storage, edit, draftOf({ basedOn: '2026-11-01T09:00:00.000Z' }));
    expect(readDraft(storage, edit, { unitSystem: 'metric', basedOn: '2026-11-01T09:00:00.000Z' })).not.toBeNull();
    // Saved again elsewhere since: the draft would undo that save, so it does not come back.
    expect(readDraft(storage, edit, { unitSystem: 'metric', basedOn: '2026-11-02T09:00:00.000Z' })).toBeNull();
    clearDraft(storage, place);
    expect(storage.entries.has(draftStorageKey(place))).toBe(false);
    expect(storage.entries.has(draftStorageKey(edit))).toBe(true);
  });

  it('drops what is not a draft of this form', () => {
    expect(parseDraft('{not json')).toBeNull();
    expect(parseDraft(JSON.stringify({ version: 2, values: {} }))).toBeNull();
    expect(parseDraft(JSON.stringify({ ...draftOf(), values: { name: 3 } }))).toBeNull();
  });

  // A stored draft changed as a stale or foreign entry might be: serialized as the planner stores it, then edited.
  type Stored = { unitSystem: unknown; values: Record<string, unknown> & { cavity: { shape: Record<string, unknown> }; sealCoat: Record<string, unknown> } };
  const storedWith = (change: (stored: Stored) => void) => {
    const stored: Stored = JSON.parse(serializeDraft(draftOf()));
    change(stored);
    return JSON.stringify(stored);
  };

  it('drops a draft whose boxes hold what the form never holds', () => {
    expect(parseDraft(storedWith(() => {}))).not.toBeNull();
    expect(parseDraft(storedWith((d) => (d.values.fillLevelMm = '24.5')))).toBeNull();
    expect(parseDraft(storedWith((d) => (d.values.cavity.shape.kind = 'hexagon')))).toBeNull();
    expect(parseDraft(storedWith((d) => (d.values.sealCoat.absorption = 'soaked')))).toBeNull();
    expect(parseDraft(storedWith((d) => (d.unitSystem = 'imperial')))).toBeNull();
  });

  it('brings a box the form never touched back empty', () => {
    const back = parseDraft(storedWith((d) => delete d.values.shopTempC));
    expect(back?.values.shopTempC).toBeNaN();
    expect(back?.values.fillLevelMm).toBe(24.5);
  });

  it('goes on when storage refuses', () => {
    const refusing = {
      getItem: () => {
        throw new Error('denied');
      },
      setItem: () => {
        throw new Error('full');
      },
      removeItem: () => {
        throw new Error('denied');
      },
    };
    expect(() => writeDraft(refusing, place, draftOf())).not.toThrow();
    expect(readDraft(refusing, place, { unitSystem: 'metric', basedOn: null })).toBeNull();
    expect(() => clearDraft(refusing, place)).not.toThrow();
  });

  it('sees no change between a box never touched, emptied, or optional and left empty', () => {
    expect(comparableValues({ a: undefined, b: Number.NaN, c: null, d: 1 })).toBe(comparableValues({ a: null, b: undefined, c: Number.NaN, d: 1 }));
    expect(comparableValues({ d: 1 })).not.toBe(comparableValues({ d: 2 }));
  });
});
