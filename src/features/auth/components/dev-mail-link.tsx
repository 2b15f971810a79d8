import { ExternalLink, Inbox } from 'lucide-react';
import { useDevMail } from '../api/get-dev-mail';

/** For the guild office: the inbox of the local fake mail service, shown only while no real SMTP server is set. */
export function DevMailLink({ className = '' }: { className?: string }) {
  const { data } = useDevMail();
  if (!data?.inboxUrl) return null;
  return (
    <a
      href={data.inboxUrl}
      target="_blank"
      rel="noreferrer"
      className={`inline-flex min-h-11 items-center gap-2 text-sm font-semibold ${className}`}
    >
      <Inbox className="size-4" aria-hidden />
      Outgoing mail (development)
      <ExternalLink className="size-3.5" aria-hidden />
      <span className="sr-only">(opens in a new tab)</span>
    </a>
  );
}
