import { z } from 'zod';
import { api } from '../api-client';
import { postFormWithProgress, type UploadProgress } from '../upload-with-progress';
import type { OutboxEntry, OutboxRequest } from './outbox-entry';

/** The multipart body of a form entry, rebuilt from what IndexedDB kept (a FormData itself cannot be stored). */
export function formDataOf(request: Extract<OutboxRequest, { type: 'form' }>): FormData {
  const body = new FormData();
  for (const [name, value] of Object.entries(request.fields)) body.append(name, value);
  if (request.photo) body.append('photo', request.photo.blob, request.photo.name);
  return body;
}

/** Sends one entry with its own key as the Idempotency-Key; answers the server's JSON as it came. */
export function sendEntry(entry: Pick<OutboxEntry, 'id' | 'request'>, onProgress?: (progress: UploadProgress) => void): Promise<unknown> {
  const { request } = entry;
  if (request.type === 'json') return api.post(request.path, request.body, z.unknown(), { idempotencyKey: entry.id });
  return postFormWithProgress(request.path, formDataOf(request), { idempotencyKey: entry.id, ...(onProgress ? { onProgress } : {}) });
}
