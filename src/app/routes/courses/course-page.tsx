import { CheckCircle2, Circle, Hammer } from 'lucide-react';
import { Link, useParams } from 'react-router-dom';
import { PageHeader } from '@/components/ui/card';
import { ErrorNotice, Loading, ProgressBar } from '@/components/ui/states';
import { paths } from '@/config/paths';
import { useCourse } from '@/features/courses/api/get-course';
import { formatMinutes, LEVEL_LABEL, lessonCountLabel } from '@/features/courses/components/format';
import { LessonMarkdown } from '@/features/courses/components/lesson-markdown';
import { SearchBox } from '@/features/courses/components/search-box';
import { ApiError } from '@/lib/api-client';
import { Component as NotFound } from '../not-found';

export function Component() {
  const { slug = '' } = useParams();
  const { data, isPending, error } = useCourse(slug);
  if (isPending) return <Loading label="Loading the course…" />;
  if (error instanceof ApiError && error.status === 404) return <NotFound />;
  if (error) return <ErrorNotice error={error} title="The course could not be loaded" />;
  const { course, lessons } = data;
  return (
    <>
      <p className="mb-2 text-sm">
        <Link to={paths.courses}>Courses</Link>
      </p>
      <PageHeader title={course.title} lead={course.summary} actions={<SearchBox />} />
      <p className="mb-4 text-sm text-muted">
        {LEVEL_LABEL[course.level]} · <span className="num">{lessonCountLabel(course.lessonCount)}</span> ·{' '}
        <span className="num">{formatMinutes(course.minutes)}</span>
      </p>
      {course.progress !== null && (
        <div className="mb-6 max-w-md space-y-1">
          <ProgressBar value={course.progress} label={`Progress in ${course.title}`} />
          <p className="text-sm text-muted">
            <span className="num">
              {course.lessonsDone} of {course.lessonCount}
            </span>{' '}
            lessons done
          </p>
        </div>
      )}
      <LessonMarkdown body={course.intro} courseSlug={course.slug} />
      <h2 className="mt-10 mb-3 font-serif text-2xl font-semibold">Lessons</h2>
      <ol className="divide-y divide-rule rounded-lg border border-rule bg-card">
        {lessons.map((lesson) => (
          <li key={lesson.id} className="flex flex-wrap items-center gap-x-4 gap-y-1 px-4 py-3">
            {lesson.done !== null &&
              (lesson.done ? (
                <span className="shrink-0 text-passed">
                  <CheckCircle2 className="size-5" aria-hidden />
                  <span className="sr-only">Done:</span>
                </span>
              ) : (
                <span className="shrink-0 text-rule">
                  <Circle className="size-5" aria-hidden />
                  <span className="sr-only">Not done yet:</span>
                </span>
              ))}
            <span className="num w-6 text-muted">{lesson.position}.</span>
            <Link to={paths.lesson(course.slug, lesson.slug)} className="min-h-11 flex-1 content-center font-semibold">
              {lesson.title}
            </Link>
            {lesson.project && (
              <span className="inline-flex items-center gap-1 rounded-full border border-brass/50 px-2.5 py-0.5 text-xs font-semibold text-brass-dark">
                <Hammer className="size-3.5" aria-hidden />
                Project: {lesson.project.title}
              </span>
            )}
            <span className="num text-sm text-muted">{formatMinutes(lesson.minutes)}</span>
          </li>
        ))}
      </ol>
    </>
  );
}
