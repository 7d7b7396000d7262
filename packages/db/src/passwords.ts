import { randomBytes, scrypt as scryptCb, timingSafeEqual, type ScryptOptions } from 'node:crypto';

// scrypt is a slow, salted, memory-hard hash (OWASP ASVS 11.4.2 names it). N = 2^15, r = 8, p = 3 is one of
// the equivalent settings the OWASP Password Storage Cheat Sheet lists (from memory): 32 MiB and about
// 0.2 s here. The cost travels with each hash, so raising it later only affects new hashes.
const KEY_LENGTH = 64;

function scrypt(password: string, salt: Buffer, opts: ScryptOptions): Promise<Buffer> {
  return new Promise((resolve, reject) => scryptCb(password.normalize('NFKC'), salt, KEY_LENGTH, opts, (err, key) => (err ? reject(err) : resolve(key))));
}

function costFromEnv(): number {
  const logN = Number(process.env.GELPOINT_SCRYPT_LOG_N ?? 15);
  return Number.isInteger(logN) && logN >= 10 && logN <= 20 ? logN : 15;
}

export async function hashPassword(password: string, logN = costFromEnv()): Promise<string> {
  const salt = randomBytes(16);
  const N = 2 ** logN;
  const r = 8;
  const p = 3;
  const key = await scrypt(password, salt, { N, r, p, maxmem: 256 * N * r });
  return `scrypt$${logN}$${r}$${p}$${salt.toString('base64url')}$${key.toString('base64url')}`;
}

export async function verifyPassword(password: string, stored: string): Promise<boolean> {
  const parts = stored.split('$');
  if (parts.length !== 6 || parts[0] !== 'scrypt') return false;
  const [, logNs, rs, ps, saltB64, keyB64] = parts as [string, string, string, string, string, string];
  const N = 2 ** Number(logNs);
  const r = Number(rs);
  const p = Number(ps);
  const expected = Buffer.from(keyB64, 'base64url');
  const key = await scrypt(password, Buffer.from(saltB64, 'base64url'), { N, r, p, maxmem: 256 * N * r });
  return key.length === expected.length && timingSafeEqual(key, expected);
}

/** Burns the same time as a real check, so an unknown e-mail is not revealed by a fast answer. */
let dummyHash: Promise<string> | undefined;
export async function verifyAgainstNothing(password: string): Promise<false> {
  dummyHash ??= hashPassword('gelpoint-timing-equaliser');
  await verifyPassword(password, await dummyHash);
  return false;
}
