import { useEffect, useRef, useState } from 'react';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { ErrorNotice } from '@/components/ui/states';

interface Props {
  /** The first button's text, e.g. "Withdraw sign-off". */
  label: string;
  /** Its name for screen readers when the text alone is ambiguous. */
  ariaLabel?: string;
  reasonLabel: string;
  confirmLabel: string;
  busy: boolean;
  error: unknown;
  onConfirm: (reason: string) => void;
}

/** A step that is kept on the record with its reason: the reason is asked for in place before it is taken. */
export function ReasonStep({ label, ariaLabel, reasonLabel, confirmLabel, busy, error, onConfirm }: Props) {
  const [open, setOpen] = useState(false);
  const [reason, setReason] = useState('');
  const box = useRef<HTMLFormElement>(null);
  useEffect(() => {
    if (open) box.current?.querySelector('input')?.focus();
  }, [open]);

  if (!open)
    return (
      <Button variant="quiet" aria-label={ariaLabel} onClick={() => setOpen(true)}>
        {label}
      </Button>
    );
  return (
    <form
      ref={box}
      noValidate
      className="w-full space-y-2 rounded-md border border-rule bg-paper p-3"
      onKeyDown={(e) => {
        if (e.key === 'Escape') setOpen(false);
      }}
      onSubmit={(e) => {
        e.preventDefault();
        onConfirm(reason.trim());
      }}
    >
      <TextField label={reasonLabel} value={reason} onChange={(e) => setReason(e.target.value)} />
      {error ? <ErrorNotice error={error} /> : null}
      <div className="flex flex-wrap justify-end gap-2">
        <Button variant="secondary" onClick={() => setOpen(false)}>
          Keep
        </Button>
        <Button type="submit" variant="danger" busy={busy} disabled={reason.trim().length < 3}>
          {confirmLabel}
        </Button>
      </div>
    </form>
  );
}
