import { useState, type FormEvent } from 'react';
import type { InviteOutcome, InviteResult } from '@shared/schemas/invitation';
import { Button } from '@/components/ui/button';
import { TextArea } from '@/components/ui/field';
import { ErrorNotice } from '@/components/ui/states';
import { useSendInvitations } from '../api/invitations';
import { InviteResults } from './invite-results';

/** Addresses may be pasted from anywhere: one per line, or separated by commas, semicolons or spaces. */
const splitAddresses = (text: string) =>
  text
    .split(/[\s,;]+/)
    .map((s) => s.trim())
    .filter(Boolean);

const RETRY = new Set<InviteOutcome>(['bad-address', 'class-full']);

export function InviteBox({ classId }: { classId: number }) {
  const [text, setText] = useState('');
  const [results, setResults] = useState<InviteResult[] | null>(null);
  const send = useSendInvitations(classId);

  function submit(e: FormEvent) {
    e.preventDefault();
    const emails = splitAddresses(text);
    if (emails.length === 0) return;
    send.mutate(emails, {
      onSuccess: (reply) => {
        setResults(reply.results);
        // Addresses that can still be put right stay in the box; the rest are done or need no retry.
        setText(
          reply.results
            .filter((r) => RETRY.has(r.outcome))
            .map((r) => r.email)
            .join('\n'),
        );
      },
    });
  }

  return (
    <form onSubmit={submit} className="space-y-3" noValidate>
      <TextArea
        label="E-mail addresses"
        rows={4}
        value={text}
        onChange={(e) => setText(e.target.value)}
        hint="One per line, or separated by commas. Someone with an account is enrolled at once; anyone else gets an invitation link valid for 14 days."
      />
      <Button type="submit" busy={send.isPending} disabled={splitAddresses(text).length === 0}>
        Send invitations
      </Button>
      {send.error && <ErrorNotice error={send.error} title="Nobody was invited" />}
      {results && <InviteResults results={results} />}
    </form>
  );
}
