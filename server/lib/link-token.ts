import { createHash, randomBytes } from 'node:crypto';

/**
 * Single-use links sent by e-mail (password resets, invitations): 32 random bytes, unguessable. Only the SHA-256 is
 * stored, so a copy of the database opens nothing.
 */
export function newLinkToken(validForMs: number, now = new Date()) {
  const token = randomBytes(32).toString('base64url');
  return { token, tokenHash: hashLinkToken(token), expiresAt: new Date(now.getTime() + validForMs) };
}

export const hashLinkToken = (token: string) => createHash('sha256').update(token).digest('hex');
