import { describe, expect, it } from 'vitest';
import { newIdempotencyKey } from './idempotency-key';

// RFC 9562 §5.4: a version 4 UUID is 8-4-4-4-12 hex digits, version nibble 4 and variant bits 10 (8, 9, a or b).
const uuidV4 = /^[0-9a-f]{8}-[0-9a-f]{4}-4[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/;

describe('newIdempotencyKey', () => {
  it('is a version 4 UUID, different every time', () => {
    const keys = Array.from({ length: 50 }, () => newIdempotencyKey());
    for (const key of keys) expect(key).toMatch(uuidV4);
    expect(new Set(keys).size).toBe(50);
  });

  it('sets the version and variant bits whatever the random bytes are', () => {
    expect(newIdempotencyKey((b) => b.fill(0xff))).toBe('ffffffff-ffff-4fff-bfff-ffffffffffff');
    expect(newIdempotencyKey((b) => b.fill(0))).toBe('00000000-0000-4000-8000-000000000000');
  });
});
