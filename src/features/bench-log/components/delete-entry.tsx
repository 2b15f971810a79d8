import { Trash2 } from 'lucide-react';
import { ConfirmStep } from '@/components/ui/confirm-step';
import { ErrorNotice } from '@/components/ui/states';
import { useDeleteLogEntry } from '../api/save-log-entry';

/** Deleting asks once more in place; comments and grades on the entry go with it. */
export function DeleteEntry({ entryId, onDeleted }: { entryId: number; onDeleted: () => void }) {
  const remove = useDeleteLogEntry();
  return (
    <div className="flex flex-col items-end gap-2">
      <ConfirmStep
        question="Delete this entry, with its comments and grades, for good?"
        confirmLabel="Delete the entry"
        keepLabel="Keep it"
        busy={remove.isPending}
        onConfirm={() => remove.mutate(entryId, { onSuccess: onDeleted })}
      >
        <Trash2 className="size-4" aria-hidden />
        Delete
      </ConfirmStep>
      {remove.error && <ErrorNotice error={remove.error} title="The entry was not deleted" />}
    </div>
  );
}
