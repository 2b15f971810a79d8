import { Printer } from 'lucide-react';
import { useParams } from 'react-router-dom';
import { isCalculatorName, type CalculatorName } from '@shared/calc/names';
import { Button, ButtonLink } from '@/components/ui/button';
import { PageHeader } from '@/components/ui/card';
import { paths } from '@/config/paths';
import { useUser } from '@/features/auth/api/get-me';
import { CalculatorShell } from '@/features/calculators/components/calculator-shell';
import { useCalculatorForm } from '@/features/calculators/forms/load-form';
import { Component as NotFound } from '../not-found';

/** One calculator on its own page, its inputs in the address so that the page can be shared or bookmarked. */
export function Component() {
  const { name = '' } = useParams();
  if (!isCalculatorName(name)) return <NotFound />;
  return <CalculatorPage name={name} />;
}

function CalculatorPage({ name }: { name: CalculatorName }) {
  const user = useUser();
  const form = useCalculatorForm(name);
  const { calculator } = form;
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
            <Button variant="secondary" onClick={() => window.print()}>
              <Printer className="size-4" aria-hidden />
              Print bench sheet
            </Button>
          </span>
        }
      />
      <CalculatorShell form={form} syncUrl />
    </>
  );
}
