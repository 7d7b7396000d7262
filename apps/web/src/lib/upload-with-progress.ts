import { env } from '../config/env';
import { buildUrl, csrfHeaderName, idempotencyHeaderName } from './api-client';
import { errorFromResponse, networkError, unexpectedResponse } from './api-error';
import { connection } from './offline/connection';

export interface UploadProgress {
  sentBytes: number;
  totalBytes: number;
}

export interface UploadOptions {
  idempotencyKey: string;
  onProgress?: (progress: UploadProgress) => void;
  basePath?: string;
}

/**
 * A multipart POST through XMLHttpRequest, whose upload events report the bytes sent (fetch has no upload progress
 * in browsers yet): a photo over a weak connection shows how far it got. Answers the parsed JSON, or throws the same
 * ApiError the JSON client does.
 */
export function postFormWithProgress(path: string, body: FormData, options: UploadOptions): Promise<unknown> {
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', buildUrl(options.basePath ?? env.apiBasePath, path));
    xhr.withCredentials = true;
    xhr.setRequestHeader('Accept', 'application/json');
    xhr.setRequestHeader(csrfHeaderName, '1');
    xhr.setRequestHeader(idempotencyHeaderName, options.idempotencyKey);
    if (options.onProgress) {
      const report = options.onProgress;
      xhr.upload.addEventListener('progress', (event) => {
        if (event.lengthComputable) report({ sentBytes: event.loaded, totalBytes: event.total });
      });
    }
    xhr.addEventListener('load', () => {
      if (xhr.status < 200 || xhr.status >= 300) return reject(errorFromResponse(xhr.status, xhr.responseText));
      try {
        resolve(JSON.parse(xhr.responseText) as unknown);
      } catch {
        reject(unexpectedResponse(xhr.status));
      }
    });
    const unreachable = () => {
      connection.unreachable();
      reject(networkError());
    };
    xhr.addEventListener('error', unreachable);
    xhr.addEventListener('timeout', unreachable);
    xhr.addEventListener('abort', () => reject(networkError()));
    xhr.send(body);
  });
}
