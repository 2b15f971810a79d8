import { INVITATION_DAYS } from '@shared/schemas/invitation';
import { newLinkToken } from '../../lib/link-token';

export const newInvitationToken = (now = new Date()) => newLinkToken(INVITATION_DAYS * 24 * 3600 * 1000, now);
