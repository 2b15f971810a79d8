import { PageHeader } from '@/components/ui/card';
import { EmptyState, ErrorNotice, Loading } from '@/components/ui/states';
import { useUser } from '@/features/auth/api/get-me';
import { useCourses } from '@/features/courses/api/get-courses';
import { CourseCard } from '@/features/courses/components/course-card';
import { SearchBox } from '@/features/courses/components/search-box';

export function Component() {
  const user = useUser();
  const { data, isPending, error } = useCourses();
  return (
    <>
      <PageHeader
        title="Courses"
        lead={
          user.role === 'apprentice'
            ? 'Written lessons with the bench arithmetic built in. Your progress shows on each course.'
            : 'Every lesson the guild teaches, open to read.'
        }
        actions={<SearchBox />}
      />
      {isPending ? (
        <Loading label="Loading the courses…" />
      ) : error ? (
        <ErrorNotice error={error} title="The courses could not be loaded" />
      ) : data.courses.length === 0 ? (
        <EmptyState title="No courses yet">
          Courses appear here once their lessons are in the content folder.
        </EmptyState>
      ) : (
        <ul className="grid gap-6 md:grid-cols-2">
          {data.courses.map((course) => (
            <li key={course.id} className="flex">
              <CourseCard course={course} />
            </li>
          ))}
        </ul>
      )}
    </>
  );
}
