import { ButtonLink } from '@/components/ui/button';
import { PageHeader } from '@/components/ui/card';
import { paths } from '@/config/paths';
import { RequireRole } from '@/app/require-role';
import { SavedCalculationList } from '@/features/calculators/components/saved-calculation-list';

export function Component() {
  return (
    <RequireRole roles={['apprentice']}>
      <PageHeader
        title="Saved results"
        lead="Calculator results you kept. Reopen one to see its working or change an input; attach them to bench-log entries."
        actions={
          <ButtonLink to={paths.calculators} variant="secondary">
            All calculators
          </ButtonLink>
        }
      />
      <SavedCalculationList />
    </RequireRole>
  );
}
