import { readDecimal } from '@gelpoint/core';
import type { OutboxEntry, OutboxRequest } from '../../../lib/offline/outbox-entry';

/** One value of a refused entry the person may change before sending it again. */
export interface EditableValue {
  name: string;
  label: string;
  kind: 'number' | 'text' | 'checkbox';
  value: string;
}

const jsonNumber = (body: Record<string, unknown>, name: string) => (typeof body[name] === 'number' ? String(body[name]) : '');

/**
 * What of each kind of entry can be changed after a refusal: the weighed grams and notes of a cup, a reading's
 * temperature, a check's hardness and note, and the answers to the server's questions (an unusual value, an
 * expired lot). The rest (which pour, which cup) is what the entry is about; to change that, discard it.
 */
export function editableValues(entry: Pick<OutboxEntry, 'kind' | 'request'>): EditableValue[] {
  const { request } = entry;
  if (entry.kind === 'batch' && request.type === 'json') {
    const b = request.body;
    const values: EditableValue[] = [
      { name: 'weighedAG', label: 'Part A weighed (g)', kind: 'number', value: jsonNumber(b, 'weighedAG') },
      { name: 'weighedBG', label: 'Part B weighed (g)', kind: 'number', value: jsonNumber(b, 'weighedBG') },
    ];
    if (typeof b.weighedPigmentG === 'number')
      values.push({ name: 'weighedPigmentG', label: 'Pigment weighed (g)', kind: 'number', value: jsonNumber(b, 'weighedPigmentG') });
    values.push(
      { name: 'notes', label: 'Notes', kind: 'text', value: typeof b.notes === 'string' ? b.notes : '' },
      { name: 'confirmUnusual', label: 'The grams are right as they are', kind: 'checkbox', value: b.confirmUnusual === true ? 'true' : '' },
      { name: 'acknowledgeExpiredLot', label: 'I know a lot is past its date', kind: 'checkbox', value: b.acknowledgeExpiredLot === true ? 'true' : '' },
    );
    return values;
  }
  if (entry.kind === 'reading' && request.type === 'json') {
    const [reading] = Array.isArray(request.body.readings) ? (request.body.readings as { tempC?: number }[]) : [];
    return [
      { name: 'tempC', label: 'Temperature (°C)', kind: 'number', value: typeof reading?.tempC === 'number' ? String(reading.tempC) : '' },
      { name: 'confirmUnusual', label: 'The temperature is right as it is', kind: 'checkbox', value: request.body.confirmUnusual === true ? 'true' : '' },
    ];
  }
  if (entry.kind === 'check' && request.type === 'form') {
    return [
      { name: 'hardnessShoreD', label: 'Hardness (Shore D)', kind: 'number', value: request.fields.hardnessShoreD ?? '' },
      { name: 'note', label: 'Note', kind: 'text', value: request.fields.note ?? '' },
    ];
  }
  return [];
}

export type EditProblem = { name: string; message: string };

/** The entry's request with the changed values, or the first value that is not a number where one is needed. */
export function applyEdits(
  request: OutboxRequest,
  kind: OutboxEntry['kind'],
  edits: Readonly<Record<string, string>>,
): { ok: true; request: OutboxRequest } | { ok: false; problem: EditProblem } {
  const numberOf = (name: string, required: boolean): number | null | EditProblem => {
    const raw = edits[name] ?? '';
    if (raw.trim() === '') return required ? { name, message: 'Enter a number.' } : null;
    return readDecimal(raw) ?? { name, message: `“${raw}” is not a number.` };
  };
  const isProblem = (v: unknown): v is EditProblem => typeof v === 'object' && v !== null && 'message' in v;

  if (request.type === 'json' && kind === 'batch') {
    const body = { ...request.body };
    for (const name of ['weighedAG', 'weighedBG', 'weighedPigmentG'] as const) {
      if (!(name in edits)) continue;
      const n = numberOf(name, name !== 'weighedPigmentG');
      if (isProblem(n)) return { ok: false, problem: n };
      if (n === null) delete body[name];
      else body[name] = n;
    }
    if ('notes' in edits) body.notes = edits.notes ?? '';
    body.confirmUnusual = edits.confirmUnusual === 'true';
    body.acknowledgeExpiredLot = edits.acknowledgeExpiredLot === 'true';
    return { ok: true, request: { ...request, body } };
  }
  if (request.type === 'json' && kind === 'reading') {
    const n = numberOf('tempC', true);
    if (isProblem(n) || n === null) return { ok: false, problem: isProblem(n) ? n : { name: 'tempC', message: 'Enter a number.' } };
    const readings = (Array.isArray(request.body.readings) ? (request.body.readings as Record<string, unknown>[]) : []).map((r) => ({ ...r, tempC: n }));
    return { ok: true, request: { ...request, body: { ...request.body, readings, confirmUnusual: edits.confirmUnusual === 'true' } } };
  }
  if (request.type === 'form' && kind === 'check') {
    const n = numberOf('hardnessShoreD', false);
    if (isProblem(n)) return { ok: false, problem: n };
    const fields: Record<string, string> = { ...request.fields, note: edits.note ?? request.fields.note ?? '' };
    if (n === null) delete fields.hardnessShoreD;
    else fields.hardnessShoreD = String(n);
    if (!fields.note) delete fields.note;
    return { ok: true, request: { ...request, fields } };
  }
  return { ok: true, request };
}
