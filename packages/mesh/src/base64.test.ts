import { describe, expect, it } from 'vitest';
import { base64ToBytes, bytesToBase64, decodeFloat32, decodeFloat64, decodeUint16, encodeFloat32, encodeFloat64, encodeUint16 } from './base64';

const bytes = (s: string): Uint8Array => new TextEncoder().encode(s);

describe('base64', () => {
  it('matches the RFC 4648 §10 test vectors', () => {
    const vectors: [string, string][] = [
      ['', ''],
      ['f', 'Zg=='],
      ['fo', 'Zm8='],
      ['foo', 'Zm9v'],
      ['foob', 'Zm9vYg=='],
      ['fooba', 'Zm9vYmE='],
      ['foobar', 'Zm9vYmFy'],
    ];
    for (const [plain, encoded] of vectors) {
      expect(bytesToBase64(bytes(plain))).toBe(encoded);
      expect(Array.from(base64ToBytes(encoded)!)).toEqual(Array.from(bytes(plain)));
    }
  });

  it('round-trips typed arrays bit for bit, little-endian', () => {
    const f64 = Float64Array.from([0, -0, 1e-300, Math.PI, -1e300, 123.456]);
    expect(Array.from(decodeFloat64(encodeFloat64(f64))!)).toEqual(Array.from(f64));
    const f32 = Float32Array.from([1.5, -2.25, 3.4e38]);
    expect(Array.from(decodeFloat32(encodeFloat32(f32))!)).toEqual(Array.from(f32));
    const u16 = Uint16Array.from([0, 1, 65535, 258]);
    expect(encodeUint16(Uint16Array.from([258]))).toBe(bytesToBase64(Uint8Array.from([2, 1])));
    expect(Array.from(decodeUint16(encodeUint16(u16))!)).toEqual(Array.from(u16));
  });

  it('refuses text that is not base64', () => {
    expect(base64ToBytes('Zm9')).toBeNull();
    expect(base64ToBytes('Zm9*')).toBeNull();
    expect(decodeFloat64(bytesToBase64(Uint8Array.from([1, 2, 3])))).toBeNull();
  });
});
