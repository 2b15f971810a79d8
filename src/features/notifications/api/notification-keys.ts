export const notificationKeys = {
  all: ['notifications'] as const,
  page: (page: number) => [...notificationKeys.all, 'page', page] as const,
  count: () => [...notificationKeys.all, 'count'] as const,
};
