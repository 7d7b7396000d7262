import type { MoldView } from '@gelpoint/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { env } from '../../../config/env';
import { buildUrl, csrfHeaderName } from '../../../lib/api-client';
import { networkError } from '../../../lib/api-error';
import { moldKeys } from '../../../lib/resources/molds';
import { moldUploadBody, readUploadAnswer, type MoldUploadInput } from './upload-answer';

export interface UploadMoldRequest extends MoldUploadInput {
  /** Share of the file sent so far, 0..1. */
  onProgress?: (sentShare: number) => void;
  signal?: AbortSignal;
}

/** XMLHttpRequest rather than fetch, because only it reports how much of the body has gone out. */
export function uploadMold({ onProgress, signal, ...input }: UploadMoldRequest): Promise<MoldView> {
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', buildUrl(env.apiBasePath, '/molds'));
    xhr.setRequestHeader('Accept', 'application/json');
    xhr.setRequestHeader(csrfHeaderName, '1');
    xhr.upload.onprogress = (event) => {
      if (event.lengthComputable && event.total > 0) onProgress?.(event.loaded / event.total);
    };
    xhr.onload = () => {
      const answer = readUploadAnswer(xhr.status, xhr.responseText);
      if (answer.ok) resolve(answer.mold);
      else reject(answer.error);
    };
    xhr.onerror = () => reject(networkError());
    xhr.onabort = () => reject(new DOMException('The upload was cancelled.', 'AbortError'));
    signal?.addEventListener('abort', () => xhr.abort(), { once: true });
    xhr.send(moldUploadBody(input));
  });
}

export function useUploadMold({ onSuccess }: { onSuccess?: (mold: MoldView) => unknown } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: uploadMold,
    onSuccess: async (mold) => {
      queryClient.setQueryData(moldKeys.detail(mold.id), mold);
      await queryClient.invalidateQueries({ queryKey: moldKeys.lists() });
      await onSuccess?.(mold);
    },
  });
}
