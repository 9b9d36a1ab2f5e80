import { createHash, randomBytes } from 'node:crypto';

/** A random, URL-safe secret; only its SHA-256 is stored. */
export function newSecret(prefix = ''): { secret: string; hash: string } {
  const secret = prefix + randomBytes(32).toString('base64url');
  return { secret, hash: hashSecret(secret) };
}

export function hashSecret(secret: string): string {
  return createHash('sha256').update(secret).digest('hex');
}
