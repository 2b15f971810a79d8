import { createHash, randomBytes } from 'node:crypto';
import { INVITATION_DAYS } from '@shared/schemas/invitation';

/** 32 random bytes: unguessable; only the SHA-256 is stored, so a copy of the database opens no invitation. */
export function newInvitationToken(now = new Date()) {
  const token = randomBytes(32).toString('base64url');
  return {
    token,
    tokenHash: hashInvitationToken(token),
    expiresAt: new Date(now.getTime() + INVITATION_DAYS * 24 * 3600 * 1000),
  };
}

export const hashInvitationToken = (token: string) => createHash('sha256').update(token).digest('hex');
