import { Save } from 'lucide-react';
import { useEffect, useRef, useState } from 'react';
import { Link } from 'react-router-dom';
import { toast } from 'sonner';
import { CalculationTitle } from '@shared/schemas/calculation';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { ErrorNotice } from '@/components/ui/states';
import { paths } from '@/config/paths';
import { useMe } from '@/features/auth/api/get-me';
import { useSaveCalculation } from '../api/save-calculation';

interface SaveResultButtonProps {
  calculator: string;
  defaultTitle: string;
  /** The calculator input as the form built it; null while the form has errors. */
  input: Record<string, unknown> | null;
}

/**
 * Saves the inputs under a title for the signed-in apprentice (the server recomputes the results). Other roles
 * see nothing: saved results belong to an apprentice's bench log.
 */
export function SaveResultButton({ calculator, defaultTitle, input }: SaveResultButtonProps) {
  const { data: user } = useMe();
  const save = useSaveCalculation();
  const [title, setTitle] = useState<string | null>(null);
  const box = useRef<HTMLDivElement>(null);
  const backToButton = useRef(false);
  // After saving or cancelling, focus goes back to "Save result" rather than to the top of the page.
  useEffect(() => {
    if (title !== null || !backToButton.current) return;
    backToButton.current = false;
    box.current?.querySelector('button')?.focus();
  }, [title]);
  const close = () => {
    backToButton.current = true;
    setTitle(null);
  };
  if (user?.role !== 'apprentice') return null;

  if (title === null) {
    return (
      <div ref={box} className="no-print mt-4">
        <Button
          variant="secondary"
          disabled={!input}
          onClick={() => {
            save.reset();
            setTitle(defaultTitle);
          }}
        >
          <Save className="size-4" aria-hidden />
          Save result
        </Button>
        {save.isSuccess && (
          <p className="mt-2 text-sm" role="status">
            Saved.{' '}
            <Link to={paths.savedCalculations} className="underline">
              See your saved results
            </Link>
          </p>
        )}
      </div>
    );
  }

  const check = CalculationTitle.safeParse(title);
  const submit = () => {
    if (!input || !check.success) return;
    save.mutate(
      { calculator, inputs: input, title: check.data },
      {
        onSuccess: () => {
          close();
          toast.success('Result saved');
        },
      },
    );
  };
  return (
    <form
      className="no-print mt-4 space-y-3 rounded-md border border-rule bg-paper p-3"
      noValidate
      onSubmit={(e) => {
        e.preventDefault();
        submit();
      }}
    >
      <TextField
        label="Title for this result"
        value={title}
        maxLength={120}
        autoFocus
        error={check.success ? undefined : check.error.issues[0]?.message}
        onChange={(e) => setTitle(e.target.value)}
      />
      {save.error && <ErrorNotice error={save.error} title="The result was not saved" />}
      <div className="flex flex-wrap gap-2">
        <Button type="submit" busy={save.isPending} disabled={!input || !check.success}>
          Save
        </Button>
        <Button variant="quiet" onClick={close}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
