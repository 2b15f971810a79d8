import { lazy, Suspense } from 'react';
import { formatMinutes } from '@shared/schemas/log-entry';
import type { HoursAgainstClass } from '@shared/schemas/record';
import { shortDay } from './evidence-list';

const HoursChart = lazy(() => import('./hours-chart'));

/** Bench time logged per week since the class began, against what the class asks, with a plain word when behind. */
export function HoursPanel({ hours, who }: { hours: HoursAgainstClass; who: 'you' | string }) {
  const asked = hours.requiredMinutesPerWeek;
  const short = Math.max(0, hours.requiredMinutes - hours.loggedMinutes);
  const subject = who === 'you' ? 'You are' : `${who} is`;
  return (
    <section aria-labelledby={`hours-${hours.class.id}`} className="rounded-lg border border-rule bg-card p-4">
      <h3 id={`hours-${hours.class.id}`} className="font-serif text-lg font-semibold">
        Bench hours in {hours.class.name}
      </h3>
      {hours.weeks.length === 0 ? (
        <p className="text-sm text-muted">The class starts on {shortDay(hours.class.startsOn)}.</p>
      ) : (
        <p className="text-sm text-muted">
          Logged <span className="num">{formatMinutes(hours.loggedMinutes)}</span> since{' '}
          {shortDay(hours.class.startsOn)}
          {asked !== null ? (
            <>
              {' '}
              of <span className="num">{formatMinutes(hours.requiredMinutes)}</span> asked to date (
              <span className="num">{formatMinutes(asked)}</span> a week).
            </>
          ) : (
            '; the class asks for no set hours.'
          )}
        </p>
      )}
      {hours.behind && (
        <p role="status" className="mt-2 rounded-md border border-rework bg-rework/5 p-2 text-sm text-rework">
          {subject} behind by more than a week’s bench time: <span className="num">{formatMinutes(short)}</span> short.
        </p>
      )}
      {hours.weeks.length > 0 && (
        <Suspense fallback={<p className="py-8 text-sm text-muted">Drawing the chart…</p>}>
          <HoursChart hours={hours} />
        </Suspense>
      )}
      {hours.weeks.length > 0 && (
        <details className="mt-2 text-sm">
          <summary className="cursor-pointer">The weeks in figures</summary>
          <table className="mt-2">
            <caption className="sr-only">Bench time per week</caption>
            <tbody>
              {hours.weeks.map((w) => (
                <tr key={w.weekStart}>
                  <th scope="row" className="pr-4 text-left font-normal">
                    Week of {shortDay(w.weekStart)}
                  </th>
                  <td className="num">{formatMinutes(w.minutes)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </details>
      )}
    </section>
  );
}
