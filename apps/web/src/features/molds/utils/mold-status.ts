import type { MoldStatus } from '../types';

export const moldStatusWords: Record<MoldStatus, { label: string; meaning: string }> = {
  queued: { label: 'Waiting', meaning: 'The file is in; its analysis starts in a moment.' },
  analysing: { label: 'Measuring', meaning: 'The cavity is being measured.' },
  ready: { label: 'Report ready', meaning: 'The cavity report is ready.' },
  failed: { label: 'Could not read', meaning: 'The file could not be measured.' },
};

/** How often to ask about a mould whose analysis is still running (about 0.7 s feels live without flooding the API). */
export const analysisPollMs = 700;

export function isAnalysing(status: MoldStatus): boolean {
  return status === 'queued' || status === 'analysing';
}

/** For a query's refetchInterval: poll while the analysis runs, stop once it is done. */
export function analysisPollInterval(status: MoldStatus | undefined): number | false {
  return status !== undefined && isAnalysing(status) ? analysisPollMs : false;
}
