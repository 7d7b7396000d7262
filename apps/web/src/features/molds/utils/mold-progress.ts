import { MoldProgressEvent } from '@gelpoint/contracts';
import type { MoldStatus, MoldView } from '../types';
import { isAnalysing } from './mold-status';

/** The event names of a mould's analysis stream: `ready` and `failed` are its last. */
export const progressEventTypes = ['progress', 'ready', 'failed'] as const;
export type ProgressEventType = (typeof progressEventTypes)[number];

/** One event of the stream, checked against the API's contract; null for anything else. */
export function readProgressEvent(type: ProgressEventType, data: unknown): { event: MoldProgressEvent; last: boolean } | null {
  if (typeof data !== 'string') return null;
  let json: unknown;
  try {
    json = JSON.parse(data);
  } catch {
    return null;
  }
  const parsed = MoldProgressEvent.safeParse(json);
  return parsed.success ? { event: parsed.data, last: type !== 'progress' } : null;
}

/** The mould as shown, moved on by an event; the report itself comes with the next read once it is ready. */
export function withProgress(view: MoldView, event: MoldProgressEvent): MoldView {
  return { ...view, status: event.status, progress: event.progress, error: event.error };
}

/** While the stream cannot be had, the page asks now and then: slowly, since each answer is the whole mould. */
export const fallbackPollMs = 5000;

/** For the mould query's refetchInterval: nothing while the stream tells the news, a slow poll if it failed. */
export function moldPollInterval(status: MoldStatus | undefined, streamFailed: boolean): number | false {
  return streamFailed && status !== undefined && isAnalysing(status) ? fallbackPollMs : false;
}
