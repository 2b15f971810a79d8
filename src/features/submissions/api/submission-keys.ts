/** Every submission query lives under `all`, so one invalidation refreshes lists, pieces and the Today panels. */
export const submissionKeys = {
  all: ['submissions'] as const,
  mine: () => [...submissionKeys.all, 'mine'] as const,
  detail: (id: number) => [...submissionKeys.all, 'detail', id] as const,
  project: (projectId: number) => [...submissionKeys.all, 'project', projectId] as const,
  linkOptions: () => [...submissionKeys.all, 'link-options'] as const,
};
