import { PageHeader } from '@/components/ui/card';
import { ErrorNotice, Loading } from '@/components/ui/states';
import { useUser } from '@/features/auth/api/get-me';
import { useClasses } from '@/features/classes/api/get-classes';
import { ClassTable } from '@/features/classes/components/class-table';

/** A mentor's classes (an apprentice sees theirs, the guild office all current ones). */
export function Component() {
  const user = useUser();
  const classes = useClasses({ archived: 'false' });
  return (
    <>
      <PageHeader
        title="Classes"
        lead={
          user.role === 'mentor'
            ? 'The classes you mentor: open one to see its apprentices and how far each has come.'
            : 'The classes you belong to.'
        }
      />
      {classes.isPending ? (
        <Loading />
      ) : classes.error ? (
        <ErrorNotice error={classes.error} />
      ) : (
        <ClassTable
          classes={classes.data}
          empty={user.role === 'mentor' ? 'You are not mentoring a class at the moment.' : 'No classes yet.'}
        />
      )}
    </>
  );
}
