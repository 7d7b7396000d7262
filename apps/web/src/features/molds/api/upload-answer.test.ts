import { MoldUploadFields } from '@gelpoint/contracts';
import { describe, expect, it } from 'vitest';
import { moldUploadBody, readUploadAnswer } from './upload-answer';

const queued = {
  id: '0f8c2a4e-7b1d-4c39-9e55-2d6a1b3c4d5e',
  name: 'Serving tray',
  fileName: 'tray.stl',
  format: 'stl',
  units: 'mm',
  fileUnits: null,
  upAxis: 'z',
  sizeBytes: 684,
  sha256: 'ab'.repeat(32),
  pieceId: null,
  status: 'queued',
  progress: 0,
  error: null,
  report: null,
  createdAt: '2026-05-01T10:00:00.000Z',
  analysedAt: null,
};

// RFC 9110: 202 Accepted (§15.3.3), 413 Content Too Large (§15.5.14), 422 Unprocessable Content (§15.5.21).
describe('readUploadAnswer', () => {
  it('takes a 202 with the queued mould', () => {
    const answer = readUploadAnswer(202, JSON.stringify(queued));
    expect(answer.ok && answer.mold.status).toBe('queued');
  });

  it('passes on the parser’s own sentence for a bad file', () => {
    const body = { error: { code: 'stl_truncated', message: 'The binary STL says it holds 12 triangles but ends after 3; export it again.' } };
    const answer = readUploadAnswer(422, JSON.stringify(body));
    expect(answer.ok).toBe(false);
    if (answer.ok) return;
    expect(answer.error.status).toBe(422);
    expect(answer.error.code).toBe('stl_truncated');
    expect(answer.error.message).toBe(body.error.message);
  });

  it('explains a file that is too large even when the body is not the API’s', () => {
    const answer = readUploadAnswer(413, '<html>Request Entity Too Large</html>');
    expect(!answer.ok && answer.error.code).toBe('too_large');
  });

  it('refuses a success whose body is not a mould', () => {
    const answer = readUploadAnswer(202, JSON.stringify({ id: 'x' }));
    expect(!answer.ok && answer.error.code).toBe('unexpected_response');
  });
});

// Reference: the WHATWG FormData the browser sends, read back field by field, and the contract's own schema.
describe('moldUploadBody', () => {
  it('carries the file as `file` and the fields the contract accepts', () => {
    const file = new Blob([new Uint8Array(84)]);
    const body = moldUploadBody({ file, fileName: 'tray.stl', units: 'in', up: 'y', name: 'Tray', pieceId: queued.id });
    const part = body.get('file');
    expect(part instanceof File && part.name).toBe('tray.stl');
    const fields = Object.fromEntries([...body.entries()].filter(([key]) => key !== 'file'));
    expect(MoldUploadFields.parse(fields)).toEqual({ units: 'in', up: 'y', name: 'Tray', pieceId: queued.id });
  });

  it('leaves the units out for a 3MF read in its own unit, which the contract accepts', () => {
    const body = moldUploadBody({ file: new Blob([]), fileName: 'bowl.3mf', up: 'z', name: 'Bowl' });
    expect(body.has('units')).toBe(false);
    const fields = Object.fromEntries([...body.entries()].filter(([key]) => key !== 'file'));
    expect(MoldUploadFields.parse(fields)).toEqual({ up: 'z', name: 'Bowl' });
  });

  it('leaves out an empty name and piece', () => {
    const body = moldUploadBody({ file: new Blob([]), fileName: 'a.stl', units: 'mm', up: 'z', name: '', pieceId: '' });
    expect(body.has('name')).toBe(false);
    expect(body.has('pieceId')).toBe(false);
  });
});
