import { Navigate, useNavigate, useSearchParams } from 'react-router-dom';
import { Card } from '@/components/ui/card';
import { Loading } from '@/components/ui/states';
import { useMe } from '@/features/auth/api/get-me';
import { SignInForm } from '@/features/auth/components/sign-in-form';

/** Only same-site paths are followed after sign-in, never a full URL from the address bar. */
const safeNext = (next: string | null) => (next && next.startsWith('/') && !next.startsWith('//') ? next : '/');

export function Component() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const { data: user, isPending } = useMe();
  const next = safeNext(params.get('next'));
  if (isPending) return <Loading />;
  if (user) return <Navigate to={next} replace />;
  return (
    <main className="mx-auto grid min-h-screen max-w-5xl items-center gap-10 px-4 py-10 md:grid-cols-2">
      <section>
        <p className="flex items-center gap-3 font-serif text-4xl font-semibold">
          <img src="/favicon.svg" alt="" className="size-10" /> Tickwright
        </p>
        <p className="mt-6 font-serif text-2xl text-ink">
          Learn clock-movement making at the bench, one made piece at a time.
        </p>
        <p className="mt-4 max-w-prose text-muted">
          Lessons with the bench arithmetic built in, a bench log of hours, measurements and photographs, and mentors
          who grade the pieces you send against clear criteria. The guild office enrols each class and keeps the record
          of what every apprentice has been signed off on.
        </p>
      </section>
      <Card>
        <h1 className="mb-4 font-serif text-xl">Sign in</h1>
        <SignInForm onSignedIn={() => navigate(next, { replace: true })} />
      </Card>
    </main>
  );
}
