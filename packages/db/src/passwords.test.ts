import { scryptSync } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { hashPassword, verifyPassword } from './passwords';

describe('password hashes', () => {
  it('uses scrypt with N = 2^15, r = 8, p = 3 by default (one of the OWASP Password Storage Cheat Sheet settings for scrypt, from memory)', async () => {
    delete process.env.GELPOINT_SCRYPT_LOG_N;
    const stored = await hashPassword('walnut and epoxy');
    const [scheme, logN, r, p, salt, key] = stored.split('$');
    expect([scheme, logN, r, p]).toEqual(['scrypt', '15', '8', '3']);
    // Independent recomputation with node's scrypt from the stored salt: the format is what it says.
    const again = scryptSync('walnut and epoxy', Buffer.from(salt!, 'base64url'), 64, { N: 2 ** 15, r: 8, p: 3, maxmem: 64 * 1024 * 1024 });
    expect(again.toString('base64url')).toBe(key);
  });

  it('salts every hash and verifies only the right password', async () => {
    const a = await hashPassword('same password', 11);
    const b = await hashPassword('same password', 11);
    expect(a).not.toBe(b);
    expect(await verifyPassword('same password', a)).toBe(true);
    expect(await verifyPassword('same passwordx', a)).toBe(false);
    expect(await verifyPassword('same password', 'not-a-hash')).toBe(false);
  });

  it('treats composed and decomposed accents as the same password (Unicode NFKC, as NIST SP 800-63B 5.1.1.2 advises)', async () => {
    const h = await hashPassword('caf\u00e9 tables', 11);
    expect(await verifyPassword('cafe\u0301 tables', h)).toBe(true);
  });
});
