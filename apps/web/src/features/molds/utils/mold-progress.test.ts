import { describe, expect, it } from 'vitest';
import type { MoldView } from '../types';
import { fallbackPollMs, moldPollInterval, readProgressEvent, withProgress } from './mold-progress';

const queued: MoldView = {
  id: '00000000-0000-4000-8000-000000000001',
  name: 'Tray',
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
  createdAt: '2026-11-01T10:00:00.000Z',
  analysedAt: null,
};

describe('the analysis events of a mould', () => {
  it('reads what the API sends, and knows its last event', () => {
    expect(readProgressEvent('progress', '{"status":"analysing","progress":0.3,"error":null}')).toEqual({
      event: { status: 'analysing', progress: 0.3, error: null },
      last: false,
    });
    expect(readProgressEvent('ready', '{"status":"ready","progress":1,"error":null}')?.last).toBe(true);
    const failed = readProgressEvent('failed', '{"status":"failed","progress":1,"error":{"code":"stl_truncated","message":"The file ends early."}}');
    expect(failed).toEqual({ event: { status: 'failed', progress: 1, error: { code: 'stl_truncated', message: 'The file ends early.' } }, last: true });
  });

  it('ignores what is not an event of the contract', () => {
    expect(readProgressEvent('progress', 'not json')).toBeNull();
    expect(readProgressEvent('progress', '{"status":"done","progress":1,"error":null}')).toBeNull();
    expect(readProgressEvent('progress', undefined)).toBeNull();
  });

  it('moves the mould on without touching the rest of it', () => {
    const moved = withProgress(queued, { status: 'analysing', progress: 0.5, error: null });
    expect(moved).toEqual({ ...queued, status: 'analysing', progress: 0.5 });
    expect(queued.status).toBe('queued');
  });

  it('polls only when the stream failed, and only while the analysis runs', () => {
    expect(moldPollInterval('analysing', false)).toBe(false);
    expect(moldPollInterval('analysing', true)).toBe(fallbackPollMs);
    expect(moldPollInterval('queued', true)).toBe(fallbackPollMs);
    expect(moldPollInterval('ready', true)).toBe(false);
    expect(moldPollInterval(undefined, true)).toBe(false);
  });
});
