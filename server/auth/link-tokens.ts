// Secrets for e-mailed and shared links: 32 random bytes (256 bits) sent once, stored only as their SHA-256,
// so a copy of the database opens no link. A fast hash is enough here: the token has full entropy, unlike
// a password, so there is nothing to guess word by word.
import { createHash, randomBytes } from 'node:crypto';

export function hashLinkToken(token: string): string {
  return createHash('sha256').update(token, 'utf8').digest('hex');
}

export function newLinkToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, hash: hashLinkToken(token) };
}
