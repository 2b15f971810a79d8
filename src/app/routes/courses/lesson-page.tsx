import { ArrowLeft, ArrowRight, CheckCircle2 } from 'lucide-react';
import { Link, useParams } from 'react-router-dom';
import { PageHeader } from '@/components/ui/card';
import { ErrorNotice, Loading } from '@/components/ui/states';
import { paths } from '@/config/paths';
import { useUser } from '@/features/auth/api/get-me';
import { useLesson, usePrefetchLesson } from '@/features/courses/api/get-lesson';
import { formatMinutes } from '@/features/courses/components/format';
import { LessonMarkdown } from '@/features/courses/components/lesson-markdown';
import { LessonToc } from '@/features/courses/components/lesson-toc';
import { MarkDoneButton } from '@/features/courses/components/mark-done-button';
import { ProjectBrief } from '@/features/courses/components/project-brief';
import { ApiError } from '@/lib/api-client';
import { Component as NotFound } from '../not-found';

export function Component() {
  const { slug = '', lessonSlug = '' } = useParams();
  const user = useUser();
  const { data, isPending, error } = useLesson(slug, lessonSlug);
  usePrefetchLesson(slug, data?.next?.slug);
  if (isPending) return <Loading label="Loading the lesson…" />;
  if (error instanceof ApiError && error.status === 404) return <NotFound />;
  if (error) return <ErrorNotice error={error} title="The lesson could not be loaded" />;
  const { course, lesson, previous, next, project } = data;
  const isApprentice = user.role === 'apprentice';
  return (
    <>
      <p className="mb-2 text-sm">
        <Link to={paths.courses}>Courses</Link> <span aria-hidden>/</span>{' '}
        <Link to={paths.course(course.slug)}>{course.title}</Link>
      </p>
      <PageHeader
        title={lesson.title}
        lead={
          <>
            Lesson <span className="num">{lesson.position}</span> ·{' '}
            <span className="num">{formatMinutes(lesson.minutes)}</span>
            {lesson.skills.length > 0 && <> · {lesson.skills.map((s) => s.label).join(', ')}</>}
          </>
        }
        actions={
          lesson.done ? (
            <span className="inline-flex items-center gap-1 font-semibold text-passed">
              <CheckCircle2 className="size-5" aria-hidden /> Done
            </span>
          ) : null
        }
      />
      <div className="gap-10 lg:grid lg:grid-cols-[minmax(0,1fr)_15rem]">
        <aside className="no-print mb-8 lg:order-2 lg:mb-0">
          <div className="lg:sticky lg:top-6">
            <LessonToc outline={lesson.outline} />
          </div>
        </aside>
        <div className="min-w-0 space-y-10 lg:order-1">
          <article aria-label={lesson.title}>
            <LessonMarkdown body={lesson.body} courseSlug={course.slug} />
          </article>
          {project && <ProjectBrief project={project} canSend={isApprentice} />}
          {isApprentice && lesson.done !== null && (
            <div className="no-print rounded-lg border border-rule bg-card p-4">
              <MarkDoneButton lessonId={lesson.id} done={lesson.done} />
            </div>
          )}
          <nav aria-label="Previous and next lesson" className="no-print flex flex-wrap justify-between gap-4">
            {previous ? (
              <Link to={paths.lesson(course.slug, previous.slug)} className="inline-flex min-h-11 items-center gap-2">
                <ArrowLeft className="size-4" aria-hidden />
                <span>
                  <span className="block text-xs text-muted">Previous lesson</span>
                  {previous.title}
                </span>
              </Link>
            ) : (
              <span />
            )}
            {next && (
              <Link
                to={paths.lesson(course.slug, next.slug)}
                className="ml-auto inline-flex min-h-11 items-center gap-2 text-right"
              >
                <span>
                  <span className="block text-xs text-muted">Next lesson</span>
                  {next.title}
                </span>
                <ArrowRight className="size-4" aria-hidden />
              </Link>
            )}
          </nav>
        </div>
      </div>
    </>
  );
}
