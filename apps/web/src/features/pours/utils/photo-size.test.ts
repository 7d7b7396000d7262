import { describe, expect, it } from 'vitest';
import { fitWithin, jpegName } from './photo-size';

describe('fitWithin', () => {
  // A 12-megapixel phone camera shoots 4032 × 3024 (4:3, from memory); at 1600 px on the long side a 4:3 picture
  // is exactly 1600 × 1200.
  it('brings a phone photo down to 1600 px on its long side, keeping its shape', () => {
    expect(fitWithin(4032, 3024)).toEqual({ widthPx: 1600, heightPx: 1200 });
    expect(fitWithin(3024, 4032)).toEqual({ widthPx: 1200, heightPx: 1600 });
  });

  it('rounds to whole pixels and keeps the ratio within half a pixel', () => {
    const { widthPx, heightPx } = fitWithin(4000, 2250);
    expect(widthPx).toBe(1600);
    expect(Math.abs(heightPx - (2250 * 1600) / 4000)).toBeLessThanOrEqual(0.5);
    expect(fitWithin(100_000, 10)).toEqual({ widthPx: 1600, heightPx: 1 });
  });

  it('never enlarges a picture that is small enough already', () => {
    expect(fitWithin(800, 600)).toEqual({ widthPx: 800, heightPx: 600 });
    expect(fitWithin(1600, 900)).toEqual({ widthPx: 1600, heightPx: 900 });
  });
});

describe('jpegName', () => {
  it('names the JPEG after the picture it came from', () => {
    expect(jpegName('IMG_2041.HEIC')).toBe('IMG_2041.jpg');
    expect(jpegName('check.png')).toBe('check.jpg');
    expect(jpegName('')).toBe('cure-check.jpg');
  });
});
