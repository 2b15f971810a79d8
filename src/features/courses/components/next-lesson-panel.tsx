import { BookOpen } from 'lucide-react';
import { Link } from 'react-router-dom';
import { ButtonLink } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ErrorNotice, Loading, ProgressBar } from '@/components/ui/states';
import { paths } from '@/config/paths';
import { useNextLesson } from '../api/get-next-lesson';
import { formatMinutes } from './format';

/** Today, for an apprentice: the first lesson not yet done in the course of their class. */
export function NextLessonPanel() {
  const { data, isPending, error } = useNextLesson();
  return (
    <Card role="region" aria-labelledby="next-lesson-heading" className="space-y-3">
      <h2 id="next-lesson-heading" className="flex items-center gap-2 font-serif text-xl font-semibold">
        <BookOpen className="size-5 text-brass" aria-hidden />
        Next lesson
      </h2>
      {isPending ? (
        <Loading label="Finding your next lesson…" />
      ) : error ? (
        <ErrorNotice error={error} title="Your next lesson could not be loaded" />
      ) : !data.course ? (
        <p className="text-muted">
          You are not enrolled in a class yet. Meanwhile, every course is open to read in{' '}
          <Link to={paths.courses}>Courses</Link>.
        </p>
      ) : (
        <>
          <p className="text-sm text-muted">
            <Link to={paths.course(data.course.slug)}>{data.course.title}</Link>
          </p>
          {data.lesson ? (
            <>
              <p className="font-serif text-lg text-ink">
                <span className="num text-muted">{data.lesson.position}.</span> {data.lesson.title}
              </p>
              <p className="text-sm text-muted num">{formatMinutes(data.lesson.minutes)}</p>
              <ButtonLink to={paths.lesson(data.course.slug, data.lesson.slug)}>Open the lesson</ButtonLink>
            </>
          ) : (
            <p className="text-ink">Every lesson of the course is marked done. Well worked.</p>
          )}
          <ProgressBar
            value={data.course.lessonCount ? data.course.lessonsDone / data.course.lessonCount : 0}
            label={`Progress in ${data.course.title}`}
          />
          <p className="text-sm text-muted">
            <span className="num">
              {data.course.lessonsDone} of {data.course.lessonCount}
            </span>{' '}
            lessons done
          </p>
        </>
      )}
    </Card>
  );
}
