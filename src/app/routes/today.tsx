import { Navigate } from 'react-router-dom';
import { PageHeader } from '@/components/ui/card';
import { paths } from '@/config/paths';
import { useUser } from '@/features/auth/api/get-me';
import { BackFromReviewPanel } from '@/features/reviews/components/back-from-review-panel';
import { WaitingPanel } from '@/features/reviews/components/waiting-panel';
import { EntriesToReadPanel } from '@/features/bench-log/components/entries-to-read-panel';
import { WeekHoursPanel } from '@/features/bench-log/components/week-hours-panel';
import { ClassesGlancePanel } from '@/features/classes/components/classes-glance-panel';
import { NextLessonPanel } from '@/features/courses/components/next-lesson-panel';

/** "Today": what to do next. Each feature contributes its own panel for the roles it serves. */
export function Component() {
  const user = useUser();
  if (user.role === 'admin') return <Navigate to={paths.guildOffice} replace />;
  const firstName = user.name.split(' ')[0];
  return (
    <>
      <PageHeader
        title={`Good to see you, ${firstName}`}
        lead={
          user.role === 'apprentice'
            ? 'Your next lesson, pieces back from review, and this week at the bench.'
            : 'Pieces waiting for you, log entries to read, and your classes at a glance.'
        }
      />
      <div className="grid gap-6 md:grid-cols-2">
        {user.role === 'mentor' && <WaitingPanel />}
        {user.role === 'apprentice' && <NextLessonPanel />}
        {user.role === 'apprentice' && <BackFromReviewPanel />}
        {user.role === 'apprentice' && <WeekHoursPanel />}
        {user.role === 'mentor' && <EntriesToReadPanel />}
        {user.role === 'mentor' && <ClassesGlancePanel />}
      </div>
    </>
  );
}
