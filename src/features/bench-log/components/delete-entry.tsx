import { Trash2 } from 'lucide-react';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { ErrorNotice } from '@/components/ui/states';
import { useDeleteLogEntry } from '../api/save-log-entry';

/** Deleting asks once more in place; comments and grades on the entry go with it. */
export function DeleteEntry({ entryId, onDeleted }: { entryId: number; onDeleted: () => void }) {
  const [asking, setAsking] = useState(false);
  const remove = useDeleteLogEntry();
  if (!asking)
    return (
      <Button variant="quiet" onClick={() => setAsking(true)}>
        <Trash2 className="size-4" aria-hidden />
        Delete
      </Button>
    );
  return (
    <div
      role="alertdialog"
      aria-label="Delete this entry?"
      className="flex flex-wrap items-center gap-2 rounded-md border border-error/40 bg-error/5 p-2"
    >
      <span className="text-sm">Delete this entry, with its comments and grades, for good?</span>
      <Button variant="danger" busy={remove.isPending} onClick={() => remove.mutate(entryId, { onSuccess: onDeleted })}>
        Delete the entry
      </Button>
      <Button variant="quiet" onClick={() => setAsking(false)}>
        Keep it
      </Button>
      {remove.error && <ErrorNotice error={remove.error} title="The entry was not deleted" />}
    </div>
  );
}
