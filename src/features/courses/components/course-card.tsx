import { Link } from 'react-router-dom';
import type { CourseCard as CourseCardData } from '@shared/schemas/course';
import { Card } from '@/components/ui/card';
import { ProgressBar } from '@/components/ui/states';
import { paths } from '@/config/paths';
import { formatMinutes, LEVEL_LABEL, lessonCountLabel } from './format';

export function CourseCard({ course }: { course: CourseCardData }) {
  return (
    <Card className="flex flex-col gap-3">
      <div className="flex items-start justify-between gap-3">
        <h2 className="font-serif text-xl font-semibold">
          <Link to={paths.course(course.slug)} className="text-ink underline decoration-brass/60 underline-offset-4">
            {course.title}
          </Link>
        </h2>
        <span className="shrink-0 rounded-full border border-brass/50 px-2.5 py-0.5 text-xs font-semibold text-brass-dark">
          {LEVEL_LABEL[course.level]}
        </span>
      </div>
      <p className="text-muted">{course.summary}</p>
      <p className="text-sm text-muted">
        <span className="num">{lessonCountLabel(course.lessonCount)}</span> ·{' '}
        <span className="num">{formatMinutes(course.minutes)}</span>
      </p>
      {course.progress !== null && (
        <div className="mt-auto space-y-1">
          <ProgressBar value={course.progress} label={`Progress in ${course.title}`} />
          <p className="text-sm text-muted">
            <span className="num">
              {course.lessonsDone} of {course.lessonCount}
            </span>{' '}
            lessons done
          </p>
        </div>
      )}
    </Card>
  );
}
