import type { Role } from '@shared/schemas/user';

export const ROLE_LABEL: Record<Role, string> = { apprentice: 'Apprentice', mentor: 'Mentor', admin: 'Guild office' };
