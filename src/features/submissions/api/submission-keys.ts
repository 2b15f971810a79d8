/** Every submission query lives under `all`, so one invalidation refreshes lists, pieces and the Today panels. */
export const submissionKeys = {
  all: ['submissions'] as const,
  mine: () => [...submissionKeys.all, 'mine'] as const,
  detail: (id: number) => [...submissionKeys.all, 'detail', id] as const,
  /** Kept outside `all`: refreshing it while the first save is under way would send the new-piece page elsewhere. */
  project: (projectId: number) => ['submission-start', projectId] as const,
  linkOptions: () => [...submissionKeys.all, 'link-options'] as const,
};
