import { CircleAlert, Clock, MailCheck } from 'lucide-react';
import type { OutboxState } from '@shared/schemas/outbox';

const LOOK: Record<OutboxState, { word: string; Icon: typeof Clock; tone: string }> = {
  queued: { word: 'Queued', Icon: Clock, tone: 'text-muted' },
  sent: { word: 'Sent', Icon: MailCheck, tone: 'text-steel' },
  failed: { word: 'Not delivered', Icon: CircleAlert, tone: 'text-error' },
};

/** An e-mail's state in the outbox, as a shape and a word (never colour alone), with the last error when there is one. */
export function MailState({ state, lastError }: { state: OutboxState; lastError?: string | null }) {
  const { word, Icon, tone } = LOOK[state];
  return (
    <span className={`inline-flex flex-col ${tone}`}>
      <span className="inline-flex items-center gap-1 font-semibold">
        <Icon className="size-4 shrink-0" aria-hidden />
        {word}
      </span>
      {lastError && state !== 'sent' && (
        <span className="text-xs text-muted">
          {state === 'queued' ? 'Retrying after: ' : ''}
          {lastError}
        </span>
      )}
    </span>
  );
}
