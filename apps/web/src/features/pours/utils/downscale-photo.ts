import { fitWithin, jpegName, photoLongSidePx } from './photo-size';

/** JPEG quality for the downscaled photo (0–1): common practice for photos, small with no visible blocks. */
const jpegQuality = 0.85;

/**
 * The camera's photo drawn at most `photoLongSidePx` on its long side and encoded as JPEG, in the browser, so a
 * 12-megapixel picture goes up as a few hundred kilobytes over the shop's Wi-Fi. A picture the browser cannot decode
 * is returned as it is: the size and type checks, and the server, judge it then.
 */
export async function downscalePhoto(file: File): Promise<File> {
  let bitmap: ImageBitmap;
  try {
    bitmap = await createImageBitmap(file, { imageOrientation: 'from-image' });
  } catch {
    return file;
  }
  try {
    const { widthPx, heightPx } = fitWithin(bitmap.width, bitmap.height, photoLongSidePx);
    if (widthPx === bitmap.width && file.type === 'image/jpeg') return file;
    const canvas = document.createElement('canvas');
    canvas.width = widthPx;
    canvas.height = heightPx;
    const context = canvas.getContext('2d');
    if (!context) return file;
    context.drawImage(bitmap, 0, 0, widthPx, heightPx);
    const blob = await new Promise<Blob | null>((resolve) => canvas.toBlob(resolve, 'image/jpeg', jpegQuality));
    return blob ? new File([blob], jpegName(file.name), { type: 'image/jpeg' }) : file;
  } finally {
    bitmap.close();
  }
}
