/**
 * A random UUID (RFC 9562 version 4) for an Idempotency-Key. crypto.randomUUID exists only in secure contexts, and a
 * shop may open Gelpoint over plain HTTP on its own network; getRandomValues works in both.
 */
export function newIdempotencyKey(random: (bytes: Uint8Array) => Uint8Array = (b) => crypto.getRandomValues(b)): string {
  const bytes = random(new Uint8Array(16));
  bytes[6] = (bytes[6]! & 0x0f) | 0x40;
  bytes[8] = (bytes[8]! & 0x3f) | 0x80;
  const hex = [...bytes].map((b) => b.toString(16).padStart(2, '0')).join('');
  return `${hex.slice(0, 8)}-${hex.slice(8, 12)}-${hex.slice(12, 16)}-${hex.slice(16, 20)}-${hex.slice(20)}`;
}
