import type { CourseLevel } from '@shared/schemas/course';

/** "50 min", "2 h", "6 h 20 min": reading and bench time as people say it. */
export function formatMinutes(total: number): string {
  const h = Math.floor(total / 60);
  const m = total % 60;
  if (h === 0) return `${m} min`;
  return m === 0 ? `${h} h` : `${h} h ${m} min`;
}

export const LEVEL_LABEL: Record<CourseLevel, string> = {
  foundation: 'Foundation',
  intermediate: 'Intermediate',
  advanced: 'Advanced',
};

export const lessonCountLabel = (n: number) => `${n} ${n === 1 ? 'lesson' : 'lessons'}`;
