import { CureCheckView } from '@gelpoint/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { CureCheck, CureCheckStageKey } from '../types';
import { refreshPour } from './refresh-pour';

export interface CureCheckInput {
  stage: CureCheckStageKey;
  checkedAt: string | null;
  hardnessShoreD: number | null;
  note: string;
  photo: File | null;
}

/** The multipart body the checks route reads: text fields, and the photo as the part named `photo`. */
export function cureCheckBody(input: CureCheckInput): FormData {
  const body = new FormData();
  body.append('stage', input.stage);
  if (input.checkedAt) body.append('checkedAt', input.checkedAt);
  if (input.hardnessShoreD !== null) body.append('hardnessShoreD', String(input.hardnessShoreD));
  if (input.note) body.append('note', input.note);
  if (input.photo) body.append('photo', input.photo, input.photo.name);
  return body;
}

export function addCureCheck(pourId: string, input: CureCheckInput): Promise<CureCheck> {
  return api.postBody(`/pours/${encodeURIComponent(pourId)}/checks`, cureCheckBody(input), null, CureCheckView);
}

export function useAddCureCheck(pourId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CureCheckInput) => addCureCheck(pourId, input),
    onSuccess: () => refreshPour(queryClient, pourId),
  });
}

export function cureCheckPhotoUrl(apiBasePath: string, pourId: string, checkId: string): string {
  return `${apiBasePath.replace(/\/+$/, '')}/pours/${encodeURIComponent(pourId)}/checks/${encodeURIComponent(checkId)}/photo`;
}
