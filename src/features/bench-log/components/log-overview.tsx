import { formatMinutes } from '@shared/schemas/log-entry';
import { Card } from '@/components/ui/card';
import { ErrorNotice, Loading } from '@/components/ui/states';
import { useLogSummary } from '../api/get-log-summary';
import { CourseTotals } from './course-totals';
import { WeeklyHoursChart } from './weekly-hours-chart';

/** The last eight weeks at the bench and the totals per course, for the log's owner or their mentor. */
export function LogOverview({ apprentice }: { apprentice?: number }) {
  const { data, error } = useLogSummary(apprentice);
  if (error) return <ErrorNotice error={error} title="The hours could not be loaded" />;
  if (!data) return <Loading label="Adding up the hours…" />;
  return (
    <div className="grid gap-6 lg:grid-cols-[2fr_1fr]">
      <Card>
        <div className="flex flex-wrap items-baseline justify-between gap-2">
          <h2 className="font-serif text-xl font-semibold">Hours per week</h2>
          <p>
            This week:{' '}
            <strong className="num" data-testid="week-hours">
              {formatMinutes(data.thisWeekMinutes)}
            </strong>
          </p>
        </div>
        <WeeklyHoursChart weeks={data.weeks} />
      </Card>
      <Card>
        <h2 className="mb-2 font-serif text-xl font-semibold">Totals per course</h2>
        <CourseTotals summary={data} />
      </Card>
    </div>
  );
}
