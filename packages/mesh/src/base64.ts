/**
 * Base64 for the typed arrays of a stored analysis. The byte order is little-endian whatever the
 * machine, so an analysis written on one machine reads back on any other; no Buffer, no atob, so
 * it runs the same in Node, workers and browsers.
 */
const alphabet = 'ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789+/';
const lookup = new Int16Array(128).fill(-1);
for (let i = 0; i < alphabet.length; i++) lookup[alphabet.charCodeAt(i)] = i;

const alphabetCodes = Uint8Array.from(alphabet, (c) => c.charCodeAt(0));

export function bytesToBase64(bytes: Uint8Array): string {
  const chars = new Uint8Array(Math.ceil(bytes.length / 3) * 4);
  let w = 0;
  const whole = bytes.length - (bytes.length % 3);
  for (let i = 0; i < whole; i += 3) {
    const triple = (bytes[i]! << 16) | (bytes[i + 1]! << 8) | bytes[i + 2]!;
    chars[w++] = alphabetCodes[triple >> 18]!;
    chars[w++] = alphabetCodes[(triple >> 12) & 63]!;
    chars[w++] = alphabetCodes[(triple >> 6) & 63]!;
    chars[w++] = alphabetCodes[triple & 63]!;
  }
  if (whole < bytes.length) {
    const b0 = bytes[whole]!,
      b1 = whole + 1 < bytes.length ? bytes[whole + 1]! : 0;
    chars[w++] = alphabetCodes[b0 >> 2]!;
    chars[w++] = alphabetCodes[((b0 & 3) << 4) | (b1 >> 4)]!;
    chars[w++] = whole + 1 < bytes.length ? alphabetCodes[(b1 & 15) << 2]! : 61;
    chars[w] = 61;
  }
  const parts: string[] = [];
  const chunk = 1 << 15;
  for (let from = 0; from < chars.length; from += chunk) {
    parts.push(String.fromCharCode.apply(null, chars.subarray(from, Math.min(chars.length, from + chunk)) as unknown as number[]));
  }
  return parts.join('');
}

/** The decoded bytes, or null when the text is not canonical base64. */
export function base64ToBytes(text: string): Uint8Array | null {
  if (text.length % 4 !== 0) return null;
  const padding = text.endsWith('==') ? 2 : text.endsWith('=') ? 1 : 0;
  const bytes = new Uint8Array((text.length / 4) * 3 - padding);
  let w = 0;
  const digit = (at: number): number => {
    const code = text.charCodeAt(at);
    if (code === 61 && at >= text.length - padding) return 0;
    return code < 128 ? lookup[code]! : -1;
  };
  for (let i = 0; i < text.length; i += 4) {
    const d0 = digit(i),
      d1 = digit(i + 1),
      d2 = digit(i + 2),
      d3 = digit(i + 3);
    if ((d0 | d1 | d2 | d3) < 0) return null;
    const triple = (d0 << 18) | (d1 << 12) | (d2 << 6) | d3;
    if (w < bytes.length) bytes[w++] = (triple >> 16) & 255;
    if (w < bytes.length) bytes[w++] = (triple >> 8) & 255;
    if (w < bytes.length) bytes[w++] = triple & 255;
  }
  return bytes;
}

const littleEndian = new Uint8Array(new Uint16Array([1]).buffer)[0] === 1;

type Typed = Float64Array | Float32Array | Uint32Array | Uint16Array;

function toLittleEndianBytes(array: Typed): Uint8Array {
  const bytes = new Uint8Array(array.buffer, array.byteOffset, array.byteLength);
  if (littleEndian) return bytes;
  const swapped = new Uint8Array(bytes.length);
  const width = array.BYTES_PER_ELEMENT;
  for (let i = 0; i < bytes.length; i += width) for (let k = 0; k < width; k++) swapped[i + k] = bytes[i + width - 1 - k]!;
  return swapped;
}

function fromLittleEndianBytes<T extends Typed>(bytes: Uint8Array, make: (buffer: ArrayBuffer) => T, width: number): T | null {
  if (bytes.length % width !== 0) return null;
  const copy = new Uint8Array(bytes.length);
  if (littleEndian) copy.set(bytes);
  else for (let i = 0; i < bytes.length; i += width) for (let k = 0; k < width; k++) copy[i + k] = bytes[i + width - 1 - k]!;
  return make(copy.buffer);
}

export function encodeFloat64(array: Float64Array): string {
  return bytesToBase64(toLittleEndianBytes(array));
}
export function encodeFloat32(array: Float32Array): string {
  return bytesToBase64(toLittleEndianBytes(array));
}
export function encodeUint16(array: Uint16Array): string {
  return bytesToBase64(toLittleEndianBytes(array));
}

export function decodeFloat64(text: string): Float64Array | null {
  const bytes = base64ToBytes(text);
  return bytes ? fromLittleEndianBytes(bytes, (b) => new Float64Array(b), 8) : null;
}
export function decodeFloat32(text: string): Float32Array | null {
  const bytes = base64ToBytes(text);
  return bytes ? fromLittleEndianBytes(bytes, (b) => new Float32Array(b), 4) : null;
}
export function decodeUint16(text: string): Uint16Array | null {
  const bytes = base64ToBytes(text);
  return bytes ? fromLittleEndianBytes(bytes, (b) => new Uint16Array(b), 2) : null;
}
