import { createHash, randomBytes } from 'node:crypto';

/** Random, URL-safe secrets for invitation links and API tokens; only their SHA-256 is stored. */
export function newSecret(prefix = ''): { secret: string; hash: string } {
  const secret = prefix + randomBytes(32).toString('base64url');
  return { secret, hash: hashSecret(secret) };
}

export const hashSecret = (secret: string) => createHash('sha256').update(secret).digest('hex');
