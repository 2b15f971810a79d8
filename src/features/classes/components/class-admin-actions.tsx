import { toast } from 'sonner';
import type { ClassDTO } from '@shared/schemas/class';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { useUpdateClass } from '../api/save-class';
import { ClassFormFields } from './class-form';

/** Editing a class (its mentors included) in place on the class page. */
export function EditClassCard({ cls, onDone }: { cls: ClassDTO; onDone: () => void }) {
  const update = useUpdateClass(cls.id);
  return (
    <Card>
      <h2 className="mb-4 font-serif text-xl">Edit class</h2>
      <ClassFormFields
        initial={cls}
        submitLabel="Save changes"
        busy={update.isPending}
        error={update.error}
        onCancel={onDone}
        onSubmit={(input, setServerErrors) =>
          update.mutate(input, {
            onSuccess: () => {
              toast.success('The class is saved.');
              onDone();
            },
            onError: setServerErrors,
          })
        }
      />
    </Card>
  );
}

/** Archiving hides the class from current lists and stops new invitations; nothing in it is deleted. */
export function ArchiveButton({ cls }: { cls: ClassDTO }) {
  const update = useUpdateClass(cls.id);
  return (
    <Button
      variant="secondary"
      busy={update.isPending}
      onClick={() =>
        update.mutate(
          { archived: !cls.archived },
          {
            onSuccess: (c) =>
              toast.success(c.archived ? `${c.name} is archived.` : `${c.name} is back among the current classes.`),
            onError: (err) => toast.error(err.message),
          },
        )
      }
    >
      {cls.archived ? 'Bring back' : 'Archive'}
    </Button>
  );
}
