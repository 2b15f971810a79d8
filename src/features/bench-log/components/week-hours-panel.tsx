import { formatMinutes } from '@shared/schemas/log-entry';
import { ButtonLink } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ErrorNotice } from '@/components/ui/states';
import { paths } from '@/config/paths';
import { useLogSummary } from '../api/get-log-summary';

/** Today, for an apprentice: this week's bench time against last week's. */
export function WeekHoursPanel() {
  const { data, error } = useLogSummary();
  const lastWeek = data?.weeks.at(-2)?.minutes ?? 0;
  return (
    <Card>
      <h2 className="font-serif text-xl font-semibold">This week’s hours</h2>
      {data ? (
        <>
          <p className="num mt-2 text-3xl">{formatMinutes(data.thisWeekMinutes)}</p>
          <p className="text-sm text-muted">
            Last week: <span className="num">{formatMinutes(lastWeek)}</span> · All time:{' '}
            <span className="num">{formatMinutes(data.totalMinutes)}</span>
          </p>
        </>
      ) : error ? (
        <div className="mt-2">
          <ErrorNotice error={error} title="Your hours could not be added up" />
        </div>
      ) : (
        <p role="status" className="mt-2 text-muted">
          Adding up…
        </p>
      )}
      <ButtonLink to={paths.benchLog} variant="secondary" className="mt-4">
        Log time at the bench
      </ButtonLink>
    </Card>
  );
}
