/** Query keys of the courses feature; marking a lesson done invalidates `all`, since lists show the same marks. */
export const courseKeys = {
  all: ['courses'] as const,
  list: () => [...courseKeys.all, 'list'] as const,
  detail: (slug: string) => [...courseKeys.all, 'detail', slug] as const,
  lesson: (courseSlug: string, lessonSlug: string) => [...courseKeys.all, 'lesson', courseSlug, lessonSlug] as const,
  next: () => [...courseKeys.all, 'next'] as const,
  search: (q: string) => ['lesson-search', q] as const,
};
