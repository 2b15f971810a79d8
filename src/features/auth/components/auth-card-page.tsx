import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { Card } from '@/components/ui/card';
import { paths } from '@/config/paths';

/** The frame of the pages reached without signing in (forgotten and new password): the name, one card. */
export function AuthCardPage({ title, lead, children }: { title: string; lead?: ReactNode; children: ReactNode }) {
  return (
    <main className="mx-auto flex min-h-screen max-w-md flex-col justify-center gap-6 px-4 py-10">
      <Link
        to={paths.signIn()}
        className="flex items-center gap-3 font-serif text-3xl font-semibold text-ink no-underline"
      >
        <img src="/favicon.svg" alt="" className="size-9" /> Tickwright
      </Link>
      <Card>
        <h1 className="font-serif text-xl">{title}</h1>
        {lead && <p className="mt-1 text-sm text-muted">{lead}</p>}
        <div className="mt-4">{children}</div>
      </Card>
    </main>
  );
}
