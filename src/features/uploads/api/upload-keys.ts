export const uploadKeys = {
  all: ['uploads'] as const,
  usage: () => [...uploadKeys.all, 'usage'] as const,
};
