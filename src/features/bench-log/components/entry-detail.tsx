import { Pencil } from 'lucide-react';
import { useState, type ReactNode } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import { formatMinutes, type LogEntryDTO } from '@shared/schemas/log-entry';
import type { UserDTO } from '@shared/schemas/user';
import { Button } from '@/components/ui/button';
import { Card, PageHeader } from '@/components/ui/card';
import { paths } from '@/config/paths';
import { useUpdateLogEntry } from '../api/save-log-entry';
import { day, when } from '../lib/when';
import { AttachedResults } from './attached-results';
import { CommentForm } from './comment-form';
import { DeleteEntry } from './delete-entry';
import { EntryForm } from './entry-form';
import { FeedbackList } from './feedback-list';
import { GradeForm } from './grade-form';
import { MeasurementsTable } from './measurements-table';
import { NotesMarkdown } from './notes-markdown';

function Section({ title, children }: { title: string; children: ReactNode }) {
  return (
    <Card>
      <h2 className="mb-3 font-serif text-xl font-semibold">{title}</h2>
      {children}
    </Card>
  );
}

/** One entry as its owner, a mentor or the guild office sees it; the owner edits and deletes, a mentor gives feedback. */
export function EntryDetail({ entry, viewer }: { entry: LogEntryDTO; viewer: UserDTO }) {
  const navigate = useNavigate();
  const [editing, setEditing] = useState(false);
  const update = useUpdateLogEntry(entry.id);
  const owner = entry.apprentice.id === viewer.id;
  const latestGrade = entry.grades.at(-1);
  const back = owner ? paths.benchLog : paths.apprenticeLog(entry.apprentice.id);

  return (
    <>
      <PageHeader
        title={entry.title}
        lead={
          <>
            {!owner && `${entry.apprentice.name} · `}
            <time dateTime={entry.date}>{day(entry.date)}</time> ·{' '}
            <span className="num">{formatMinutes(entry.minutes)}</span>
            {entry.lesson && (
              <>
                {' · '}
                <Link to={paths.lesson(entry.lesson.course.slug, entry.lesson.slug)} className="underline">
                  {entry.lesson.title}
                </Link>
              </>
            )}
          </>
        }
        actions={
          owner && !editing ? (
            <>
              <Button variant="secondary" onClick={() => setEditing(true)}>
                <Pencil className="size-4" aria-hidden />
                Edit
              </Button>
              <DeleteEntry entryId={entry.id} onDeleted={() => navigate(paths.benchLog)} />
            </>
          ) : undefined
        }
      />
      <p className="mb-4">
        <Link to={back}>← Back to {owner ? 'your bench log' : `${entry.apprentice.name}’s bench log`}</Link>
      </p>
      {entry.changedAfterGradingAt && latestGrade && (
        <p role="status" className="mb-4 rounded-md border border-rework/40 bg-rework/10 p-3 text-rework">
          Changed after grading at{' '}
          <time dateTime={entry.changedAfterGradingAt}>{when(entry.changedAfterGradingAt)}</time>: the entry is now at
          version {entry.version}, and the latest grade was given on version {latestGrade.entryVersion}.
        </p>
      )}
      {editing ? (
        <Card>
          <EntryForm
            userId={viewer.id}
            entry={entry}
            onSave={(input) => update.mutateAsync(input)}
            onSaved={() => setEditing(false)}
            onCancel={() => setEditing(false)}
          />
        </Card>
      ) : (
        <div className="space-y-6">
          <Section title="Notes">
            <NotesMarkdown text={entry.notes} />
          </Section>
          <Section title="Measurements">
            <MeasurementsTable measurements={entry.measurements} />
          </Section>
          <Section title="Photos">
            {entry.photos.length === 0 ? (
              <p className="text-muted">No photos attached.</p>
            ) : (
              <ul className="grid grid-cols-2 gap-3 md:grid-cols-3">
                {entry.photos.map((p, i) => (
                  <li key={p.id}>
                    <a href={p.viewUrl} target="_blank" rel="noreferrer">
                      <img
                        src={p.thumbUrl}
                        alt={`Photo ${i + 1} of ${entry.photos.length} for “${entry.title}”`}
                        className="aspect-4/3 w-full rounded-md border border-rule object-cover"
                        loading="lazy"
                      />
                    </a>
                  </li>
                ))}
              </ul>
            )}
          </Section>
          <Section title="Saved results">
            <AttachedResults calculations={entry.calculations} />
          </Section>
          <Section title="Comments and grades">
            <FeedbackList entry={entry} />
            {viewer.role === 'mentor' && (
              <div className="mt-6 grid gap-8 lg:grid-cols-2">
                <CommentForm entryId={entry.id} />
                <GradeForm entryId={entry.id} />
              </div>
            )}
          </Section>
        </div>
      )}
    </>
  );
}
