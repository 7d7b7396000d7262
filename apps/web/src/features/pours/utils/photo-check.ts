export const photoTypes = ['image/jpeg', 'image/png', 'image/webp'] as const;
/** The API's limit for a cure-check photo: 8 MB (8 × 1024 × 1024 bytes). */
export const maxPhotoBytes = 8 * 1024 * 1024;

export interface PhotoProblem {
  code: 'photo_type' | 'photo_too_large';
  message: string;
}

/** Says before uploading what the API would refuse, so a big phone photo is not sent for nothing. */
export function photoProblem(file: { type: string; size: number }): PhotoProblem | null {
  if (!(photoTypes as readonly string[]).includes(file.type)) {
    return { code: 'photo_type', message: 'The photo must be a JPEG, PNG or WebP image. Take it with the camera or pick another file.' };
  }
  if (file.size > maxPhotoBytes) {
    const mb = (file.size / (1024 * 1024)).toFixed(1);
    return { code: 'photo_too_large', message: `The photo is ${mb} MB; at most 8 MB can be sent. Take it at a lower resolution or crop it.` };
  }
  return null;
}
