export const calculationKeys = {
  all: ['calculations'] as const,
  list: (apprenticeId?: number) => [...calculationKeys.all, 'list', apprenticeId ?? 'mine'] as const,
};
