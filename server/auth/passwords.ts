import { randomBytes, scrypt as scryptCb, timingSafeEqual, type ScryptOptions } from 'node:crypto';

// N = 2^14 costs about 40 ms per hash on our 2-core machines: slow for guessing, fine for sign-in.
const params: ScryptOptions = { N: 16384, r: 8, p: 1, maxmem: 64 * 1024 * 1024 };
const keyLength = 64;

function scrypt(password: string, salt: Buffer): Promise<Buffer> {
  return new Promise((resolve, reject) =>
    scryptCb(password, salt, keyLength, params, (err, key) => (err ? reject(err) : resolve(key))),
  );
}

/** Stored as `scrypt$<salt>$<key>` (base64), with a fresh 16-byte salt per user. */
export async function hashPassword(password: string): Promise<string> {
  const salt = randomBytes(16);
  const key = await scrypt(password, salt);
  return `scrypt$${salt.toString('base64')}$${key.toString('base64')}`;
}

export async function verifyPassword(password: string, stored: string): Promise<boolean> {
  const [scheme, saltB64, keyB64] = stored.split('$');
  if (scheme !== 'scrypt' || !saltB64 || !keyB64) return false;
  const expected = Buffer.from(keyB64, 'base64');
  const actual = await scrypt(password, Buffer.from(saltB64, 'base64'));
  return actual.length === expected.length && timingSafeEqual(actual, expected);
}

/** A hash of nothing, compared against when the e-mail is unknown so timing does not tell. */
export const dummyHash = 'scrypt$AAAAAAAAAAAAAAAAAAAAAA==$' + Buffer.alloc(keyLength).toString('base64');
