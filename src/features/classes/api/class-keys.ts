import type { ClassListQuery } from '@shared/schemas/class';

export const classKeys = {
  all: ['classes'] as const,
  list: (filters: ClassListQuery) => [...classKeys.all, 'list', filters] as const,
  detail: (id: number) => [...classKeys.all, 'detail', id] as const,
  roster: (id: number) => [...classKeys.all, 'roster', id] as const,
  formOptions: () => [...classKeys.all, 'form-options'] as const,
  invitations: (classId?: number) => [...classKeys.all, 'invitations', classId ?? 'every'] as const,
  invitation: (token: string) => ['invitation', token] as const,
};
