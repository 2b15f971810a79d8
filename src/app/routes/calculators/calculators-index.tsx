import { ChevronRight } from 'lucide-react';
import { Link } from 'react-router-dom';
import { calculators } from '@shared/calc/index';
import { CALCULATOR_NAMES } from '@shared/calc/names';
import { ButtonLink } from '@/components/ui/button';
import { Card, PageHeader } from '@/components/ui/card';
import { paths } from '@/config/paths';
import { useUser } from '@/features/auth/api/get-me';
import { FORMS } from '@/features/calculators/forms';

/** Every bench calculator in bench order; the ones whose form is not made yet are shown but not linked. */
export function Component() {
  const user = useUser();
  return (
    <>
      <PageHeader
        title="Calculators"
        lead="The arithmetic of the bench, worked out as you type, with the formulas, the sources and the cautions beside it."
        actions={
          user.role === 'apprentice' && (
            <ButtonLink to={paths.savedCalculations} variant="secondary">
              Saved results
            </ButtonLink>
          )
        }
      />
      <ul className="grid gap-4 md:grid-cols-2">
        {CALCULATOR_NAMES.map((name) => {
          const c = calculators[name];
          const ready = Boolean(FORMS[name]);
          return (
            <li key={name}>
              <Card className={`h-full ${ready ? 'hover:border-brass' : 'opacity-80'}`}>
                <h2 className="font-serif text-xl font-semibold">
                  {ready ? (
                    <Link to={paths.calculator(name)} className="inline-flex min-h-11 items-center gap-1 no-underline">
                      {c.title}
                      <ChevronRight className="size-5" aria-hidden />
                    </Link>
                  ) : (
                    c.title
                  )}
                </h2>
                <p className="mt-1 text-muted">{c.summary}</p>
                {!ready && <p className="mt-2 text-sm font-semibold text-rework">Form still being made</p>}
              </Card>
            </li>
          );
        })}
      </ul>
    </>
  );
}
