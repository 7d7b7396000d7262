/** The long side a cure-check photo is sent at: plenty to see a tacky surface, a fraction of a phone camera's file. */
export const photoLongSidePx = 1600;

/**
 * The size to draw a picture at so its long side is at most `maxLongSidePx`, keeping its shape (rounded to whole
 * pixels, never below one); a picture already small enough keeps its size (never enlarged).
 */
export function fitWithin(widthPx: number, heightPx: number, maxLongSidePx: number = photoLongSidePx): { widthPx: number; heightPx: number } {
  const longSide = Math.max(widthPx, heightPx);
  if (longSide <= maxLongSidePx) return { widthPx, heightPx };
  const scale = maxLongSidePx / longSide;
  return { widthPx: Math.max(1, Math.round(widthPx * scale)), heightPx: Math.max(1, Math.round(heightPx * scale)) };
}

/** "photo.heic" → "photo.jpg": the name of the JPEG the browser made from it. */
export function jpegName(name: string): string {
  const base = name.replace(/\.[A-Za-z0-9]{1,5}$/, '');
  return `${base || 'cure-check'}.jpg`;
}
