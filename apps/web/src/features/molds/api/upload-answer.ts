import { MoldView } from '@gelpoint/contracts';
import { errorFromResponse, unexpectedResponse, type ApiError } from '../../../lib/api-error';
import type { MoldUnits, UpAxis } from '../types';

export interface MoldUploadInput {
  file: Blob;
  fileName: string;
  /** Absent: a 3MF is read in the unit it states, any other file in mm. */
  units?: MoldUnits;
  up: UpAxis;
  name?: string;
  pieceId?: string;
}

/** The API refuses bodies over 100 MB; the form says so before sending anything that large. */
export const maxUploadBytes = 100 * 1024 * 1024;

/** The multipart body the upload route reads: the file as `file`, the rest as text fields. */
export function moldUploadBody(input: MoldUploadInput): FormData {
  const body = new FormData();
  if (input.units) body.append('units', input.units);
  body.append('up', input.up);
  if (input.name) body.append('name', input.name);
  if (input.pieceId) body.append('pieceId', input.pieceId);
  body.append('file', input.file, input.fileName);
  return body;
}

export type UploadAnswer = { ok: true; mold: MoldView } | { ok: false; error: ApiError };

/**
 * What the upload's answer means: 202 Accepted with the queued mould (RFC 9110 §15.3.3, the work
 * goes on after the answer), or an error in the API's own words.
 */
export function readUploadAnswer(status: number, bodyText: string): UploadAnswer {
  if (status < 200 || status >= 300) return { ok: false, error: errorFromResponse(status, bodyText) };
  let json: unknown;
  try {
    json = JSON.parse(bodyText);
  } catch {
    return { ok: false, error: unexpectedResponse(status) };
  }
  const parsed = MoldView.safeParse(json);
  return parsed.success ? { ok: true, mold: parsed.data } : { ok: false, error: unexpectedResponse(status) };
}
