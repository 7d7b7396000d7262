import { describe, expect, it } from 'vitest';
import { maxPhotoBytes, photoProblem } from './photo-check';

describe('photoProblem', () => {
  it('takes JPEG, PNG and WebP by their IANA media types', () => {
    // IANA media types registry: image/jpeg, image/png, image/webp.
    for (const type of ['image/jpeg', 'image/png', 'image/webp']) expect(photoProblem({ type, size: 1000 })).toBeNull();
    expect(photoProblem({ type: 'image/heic', size: 1000 })?.code).toBe('photo_type');
    expect(photoProblem({ type: '', size: 1000 })?.code).toBe('photo_type');
  });

  it('refuses anything over 8 MB', () => {
    // IEC 80000-13 binary multiples: 8 MiB = 8 × 2^20 = 8,388,608 bytes.
    expect(maxPhotoBytes).toBe(8_388_608);
    expect(photoProblem({ type: 'image/png', size: 8_388_608 })).toBeNull();
    const big = photoProblem({ type: 'image/jpeg', size: 8_388_609 + 1024 * 1024 });
    expect(big?.code).toBe('photo_too_large');
    expect(big?.message).toContain('9.0 MB');
  });
});
