import { useEffect, useId, useRef, useState, type ReactNode } from 'react';
import { Button } from './button';

interface Props {
  /** What the first button shows. */
  children: ReactNode;
  /** The first button's name for screen readers when its text alone is ambiguous (e.g. "Withdraw Ned Pellow"). */
  label?: string;
  variant?: 'quiet' | 'secondary';
  question: ReactNode;
  confirmLabel: ReactNode;
  keepLabel?: string;
  busy?: boolean;
  onConfirm: () => void;
}

/**
 * A step that is hard to undo asks once more, in place. Focus moves to the safe answer, so that a keyboard user is
 * not dropped at the top of the page; "keep" or Escape puts focus back on the first button.
 */
export function ConfirmStep({
  children,
  label,
  variant = 'quiet',
  question,
  confirmLabel,
  keepLabel = 'Keep',
  busy,
  onConfirm,
}: Props) {
  const [asking, setAsking] = useState(false);
  const box = useRef<HTMLSpanElement>(null);
  const returnFocus = useRef(false);
  const questionId = useId();

  useEffect(() => {
    if (asking) box.current?.querySelector<HTMLButtonElement>('[data-keep]')?.focus();
    else if (returnFocus.current) {
      returnFocus.current = false;
      box.current?.querySelector('button')?.focus();
    }
  }, [asking]);

  const keep = () => {
    returnFocus.current = true;
    setAsking(false);
  };

  return (
    <span ref={box} className="inline-flex flex-wrap items-center justify-end gap-2">
      {asking ? (
        <span
          role="group"
          aria-labelledby={questionId}
          className="inline-flex flex-wrap items-center justify-end gap-2"
          onKeyDown={(e) => {
            if (e.key === 'Escape') keep();
          }}
        >
          <span id={questionId} className="basis-full text-right text-sm">
            {question}
          </span>
          <Button variant="danger" busy={busy} onClick={onConfirm}>
            {confirmLabel}
          </Button>
          <Button variant="secondary" data-keep onClick={keep}>
            {keepLabel}
          </Button>
        </span>
      ) : (
        <Button variant={variant} busy={busy} aria-label={label} onClick={() => setAsking(true)}>
          {children}
        </Button>
      )}
    </span>
  );
}
