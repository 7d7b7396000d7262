import type { MoldStatus } from '../types';

export const moldStatusWords: Record<MoldStatus, { label: string; meaning: string }> = {
  queued: { label: 'Waiting', meaning: 'The file is in; its analysis starts in a moment.' },
  analysing: { label: 'Measuring', meaning: 'The cavity is being measured.' },
  ready: { label: 'Report ready', meaning: 'The cavity report is ready.' },
  failed: { label: 'Could not read', meaning: 'The file could not be measured.' },
};

export function isAnalysing(status: MoldStatus): boolean {
  return status === 'queued' || status === 'analysing';
}
