import { ButtonLink } from '@/components/ui/button';
import { paths } from '@/config/paths';

export function Component() {
  return (
    <div className="py-16 text-center">
      <h1 className="font-serif text-3xl">Nothing at this address</h1>
      <p className="mt-2 text-muted">The page may have moved, or the link may be mistyped.</p>
      <ButtonLink to={paths.home} className="mt-6">
        Back to Today
      </ButtonLink>
    </div>
  );
}
