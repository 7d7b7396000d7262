import { CureCheckView, type PourView } from '@gelpoint/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { unexpectedResponse } from '../../../lib/api-error';
import { useOutbox } from '../../../lib/offline/outbox-context';
import type { FormRequest } from '../../../lib/offline/outbox-entry';
import { formDataOf } from '../../../lib/offline/send-entry';
import type { UploadProgress } from '../../../lib/upload-with-progress';
import type { CureCheck, CureCheckStageKey } from '../types';
import { checkStageWords } from '../utils/cure-words';
import { pourKeys } from './keys';
import { refreshPour } from './refresh-pour';

export interface CureCheckInput {
  stage: CureCheckStageKey;
  checkedAt: string | null;
  hardnessShoreD: number | null;
  note: string;
  /** A File from the picker, or the Blob the browser downscaled it to. */
  photo: (Blob & { name?: string }) | null;
}

/** The multipart request the checks route reads: text fields, and the photo as the part named `photo`. */
export function cureCheckRequest(pourId: string, input: CureCheckInput): FormRequest {
  const fields: Record<string, string> = { stage: input.stage };
  if (input.checkedAt) fields.checkedAt = input.checkedAt;
  if (input.hardnessShoreD !== null) fields.hardnessShoreD = String(input.hardnessShoreD);
  if (input.note) fields.note = input.note;
  return {
    type: 'form',
    path: `/pours/${encodeURIComponent(pourId)}/checks`,
    fields,
    photo: input.photo ? { blob: input.photo, name: input.photo.name ?? 'check.jpg' } : null,
  };
}

export function cureCheckBody(input: CureCheckInput): FormData {
  return formDataOf(cureCheckRequest('', input));
}

export type CureCheckAnswer = { queued: false; check: CureCheck } | { queued: true };

export function useAddCureCheck(pourId: string, onProgress?: (progress: UploadProgress) => void) {
  const queryClient = useQueryClient();
  const outbox = useOutbox();
  return useMutation({
    // Runs with the network cut too: the outbox keeps the entry then, where a paused mutation would keep nothing.
    networkMode: 'always',
    mutationFn: async (input: CureCheckInput): Promise<CureCheckAnswer> => {
      const pieceName = queryClient.getQueryData<PourView>(pourKeys.detail(pourId))?.piece.name;
      const label = `Cure check (${checkStageWords[input.stage].toLowerCase()})${input.photo ? ' with a photo' : ''}${pieceName ? `, ${pieceName}` : ''}`;
      const done = await outbox.submit({ kind: 'check', pourId, label, request: cureCheckRequest(pourId, input) }, onProgress);
      if (done.queued) return { queued: true };
      const parsed = CureCheckView.safeParse(done.answer);
      if (!parsed.success) throw unexpectedResponse(201);
      return { queued: false, check: parsed.data };
    },
    onSuccess: (answer) => (answer.queued ? undefined : refreshPour(queryClient, pourId)),
  });
}

export function cureCheckPhotoUrl(apiBasePath: string, pourId: string, checkId: string): string {
  return `${apiBasePath.replace(/\/+$/, '')}/pours/${encodeURIComponent(pourId)}/checks/${encodeURIComponent(checkId)}/photo`;
}
