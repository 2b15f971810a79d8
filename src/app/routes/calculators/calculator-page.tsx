import { Printer } from 'lucide-react';
import { useParams } from 'react-router-dom';
import { calculators, isCalculatorName } from '@shared/calc/index';
import { Button, ButtonLink } from '@/components/ui/button';
import { Card, PageHeader } from '@/components/ui/card';
import { paths } from '@/config/paths';
import { useUser } from '@/features/auth/api/get-me';
import { CalculatorShell } from '@/features/calculators/components/calculator-shell';
import { FORMS } from '@/features/calculators/forms';
import { Component as NotFound } from '../not-found';

/** One calculator on its own page, its inputs in the address so that the page can be shared or bookmarked. */
export function Component() {
  const { name = '' } = useParams();
  const user = useUser();
  if (!isCalculatorName(name)) return <NotFound />;
  const calculator = calculators[name];
  const form = FORMS[name];
  return (
    <>
      <PageHeader
        title={calculator.title}
        lead={calculator.summary}
        actions={
          <span className="no-print flex flex-wrap gap-2">
            <ButtonLink to={paths.calculators} variant="quiet">
              All calculators
            </ButtonLink>
            {user.role === 'apprentice' && (
              <ButtonLink to={paths.savedCalculations} variant="secondary">
                Saved results
              </ButtonLink>
            )}
            {form && (
              <Button variant="secondary" onClick={() => window.print()}>
                <Printer className="size-4" aria-hidden />
                Print bench sheet
              </Button>
            )}
          </span>
        }
      />
      {form ? (
        <CalculatorShell form={form} syncUrl />
      ) : (
        <Card>
          <p className="text-muted">The form for this calculator is still being made.</p>
        </Card>
      )}
    </>
  );
}
