import { useState } from 'react';
import type { ClassListQuery } from '@shared/schemas/class';
import { RequireRole } from '@/app/require-role';
import { PageHeader } from '@/components/ui/card';
import { SelectField } from '@/components/ui/field';
import { ErrorNotice, Loading } from '@/components/ui/states';
import { useClasses } from '@/features/classes/api/get-classes';
import { ClassTable } from '@/features/classes/components/class-table';
import { NewClassCard } from '@/features/classes/components/new-class-card';
import { OfficeNav } from './office-nav';

type Shown = 'current' | 'archived' | 'all';
const FILTER: Record<Shown, ClassListQuery> = {
  current: { archived: 'false' },
  archived: { archived: 'true' },
  all: {},
};

export function Component() {
  return (
    <RequireRole roles={['admin']}>
      <GuildOffice />
    </RequireRole>
  );
}

function GuildOffice() {
  const [shown, setShown] = useState<Shown>('current');
  const classes = useClasses(FILTER[shown]);
  return (
    <>
      <PageHeader
        title="Guild office"
        lead="Classes and their mentors, the people who use Tickwright, invitations and the record of what the office did."
      />
      <OfficeNav />
      <section aria-labelledby="classes-heading" className="space-y-4">
        <div className="flex flex-wrap items-end justify-between gap-4">
          <h2 id="classes-heading" className="font-serif text-2xl">
            Classes
          </h2>
          <div className="w-52">
            <SelectField label="Show" value={shown} onChange={(e) => setShown(e.target.value as Shown)}>
              <option value="current">Current classes</option>
              <option value="archived">Archived classes</option>
              <option value="all">All classes</option>
            </SelectField>
          </div>
        </div>
        <NewClassCard />
        {classes.isPending ? (
          <Loading />
        ) : classes.error ? (
          <ErrorNotice error={classes.error} />
        ) : (
          <ClassTable
            classes={classes.data}
            empty={shown === 'archived' ? 'No archived classes.' : 'No classes yet: create the first one.'}
          />
        )}
      </section>
    </>
  );
}
