import { formatMinutes } from '@shared/schemas/log-entry';
import { useState, type ReactNode } from 'react';
import { Link, useParams } from 'react-router-dom';
import type { ClassDTO } from '@shared/schemas/class';
import { Button } from '@/components/ui/button';
import { Card, PageHeader } from '@/components/ui/card';
import { ErrorNotice, Loading } from '@/components/ui/states';
import { paths } from '@/config/paths';
import { useUser } from '@/features/auth/api/get-me';
import { useClass, useRoster } from '@/features/classes/api/get-classes';
import { ArchiveButton, EditClassCard } from '@/features/classes/components/class-admin-actions';
import { formatDay } from '@/features/classes/components/format';
import { InviteBox } from '@/features/classes/components/invite-box';
import { PendingInvitations } from '@/features/classes/components/pending-invitations';
import { RosterTable } from '@/features/classes/components/roster-table';
import { RosterUpload } from '@/features/classes/components/roster-upload';

export function Component() {
  const id = Number(useParams().id);
  const user = useUser();
  const cls = useClass(id);
  const [editing, setEditing] = useState(false);
  if (cls.isPending) return <Loading label="Loading the class…" />;
  if (cls.error) return <ErrorNotice error={cls.error} title="This class cannot be shown" />;
  const isAdmin = user.role === 'admin';
  const c = cls.data;

  return (
    <>
      <Link to={isAdmin ? paths.guildOffice : paths.classes} className="text-sm">
        ← {isAdmin ? 'Guild office' : 'Classes'}
      </Link>
      <PageHeader
        title={c.name}
        lead={
          <>
            <Link to={paths.course(c.course.slug)}>{c.course.title}</Link> · {formatDay(c.startsOn)} –{' '}
            {formatDay(c.endsOn)}
            {c.archived && <strong className="ml-2 text-muted">(archived)</strong>}
          </>
        }
        actions={
          isAdmin && !editing ? (
            <>
              <Button variant="secondary" onClick={() => setEditing(true)}>
                Edit class
              </Button>
              <ArchiveButton cls={c} />
            </>
          ) : undefined
        }
      />
      <div className="space-y-8">
        {editing ? <EditClassCard cls={c} onDone={() => setEditing(false)} /> : <Summary cls={c} />}
        {user.role !== 'apprentice' && (
          <Section title="Roster">
            <Roster classId={id} canEdit={isAdmin} />
          </Section>
        )}
        {isAdmin && !c.archived && (
          <div className="grid gap-6 lg:grid-cols-2">
            <Card>
              <h2 className="mb-3 font-serif text-xl">Invite by e-mail</h2>
              <InviteBox classId={id} />
            </Card>
            <Card>
              <h2 className="mb-3 font-serif text-xl">Upload a roster</h2>
              <RosterUpload classId={id} />
            </Card>
          </div>
        )}
        {isAdmin && (
          <Section title="Open invitations">
            <PendingInvitations classId={id} />
          </Section>
        )}
      </div>
    </>
  );
}

function Summary({ cls }: { cls: ClassDTO }) {
  return (
    <Card>
      <dl className="grid gap-x-8 gap-y-3 sm:grid-cols-3">
        <div>
          <dt className="text-sm text-muted">Mentors</dt>
          <dd className="font-semibold">{cls.mentors.map((m) => m.name).join(', ') || 'None assigned yet'}</dd>
        </div>
        <div>
          <dt className="text-sm text-muted">Apprentices</dt>
          <dd>
            <span className="num font-semibold">{cls.counts.active}</span> of{' '}
            <span className="num">{cls.capacity}</span> seats taken
            {cls.counts.withdrawn > 0 && (
              <span className="text-muted">
                {' '}
                · <span className="num">{cls.counts.withdrawn}</span> withdrawn
              </span>
            )}
          </dd>
        </div>
        <div>
          <dt className="text-sm text-muted">Seats left</dt>
          <dd>
            <span className="num font-semibold">{cls.counts.seatsLeft}</span>
            {cls.counts.invited > 0 && (
              <span className="text-muted">
                {' '}
                · <span className="num">{cls.counts.invited}</span> held by open invitations
              </span>
            )}
          </dd>
        </div>
        <div>
          <dt className="text-sm text-muted">Bench time asked</dt>
          <dd>
            {cls.requiredMinutesPerWeek === null ? (
              'No set hours'
            ) : (
              <>
                <span className="num font-semibold">{formatMinutes(cls.requiredMinutesPerWeek)}</span> a week
              </>
            )}
          </dd>
        </div>
      </dl>
    </Card>
  );
}

function Section({ title, children }: { title: string; children: ReactNode }) {
  const id = `section-${title.toLowerCase().replace(/\s+/g, '-')}`;
  return (
    <section aria-labelledby={id} className="space-y-3">
      <h2 id={id} className="font-serif text-2xl">
        {title}
      </h2>
      {children}
    </section>
  );
}

function Roster({ classId, canEdit }: { classId: number; canEdit: boolean }) {
  const roster = useRoster(classId);
  if (roster.isPending) return <Loading label="Loading the roster…" />;
  if (roster.error) return <ErrorNotice error={roster.error} title="The roster could not be loaded" />;
  return <RosterTable classId={classId} roster={roster.data} canEdit={canEdit} />;
}
