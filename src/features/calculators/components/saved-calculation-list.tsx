import { FolderOpen, Trash2 } from 'lucide-react';
import { toast } from 'sonner';
import { calculators } from '@shared/calc/index';
import { isCalculatorName } from '@shared/calc/names';
import type { CalculationDTO } from '@shared/schemas/calculation';
import { ButtonLink } from '@/components/ui/button';
import { ConfirmStep } from '@/components/ui/confirm-step';
import { Card } from '@/components/ui/card';
import { EmptyState, ErrorNotice, Loading } from '@/components/ui/states';
import { paths } from '@/config/paths';
import { useDeleteCalculation } from '../api/delete-calculation';
import { useCalculations } from '../api/get-calculations';
import { draftFromSaved, FORMS } from '../forms';
import { draftToSearch } from '../lib/draft';

const savedOn = (iso: string) => new Date(iso).toLocaleString('en-GB', { dateStyle: 'medium', timeStyle: 'short' });

/** Where a saved result reopens: its calculator's page with the inputs in the address; null without a form. */
function reopenLink(c: CalculationDTO): string | null {
  const form = isCalculatorName(c.calculator) ? FORMS[c.calculator] : undefined;
  if (!form) return null;
  return `${paths.calculator(c.calculator)}?${draftToSearch(draftFromSaved(form, c.inputs))}`;
}

function SavedItem({ calculation: c }: { calculation: CalculationDTO }) {
  const remove = useDeleteCalculation();
  const link = reopenLink(c);
  const calcTitle = isCalculatorName(c.calculator) ? calculators[c.calculator].title : c.calculator;
  return (
    <li>
      <Card className="flex flex-wrap items-center justify-between gap-4">
        <div>
          <h2 className="font-serif text-lg font-semibold">{c.title}</h2>
          <p className="text-sm text-muted">
            {calcTitle} · saved <time dateTime={c.createdAt}>{savedOn(c.createdAt)}</time>
            {c.warnings.length > 0 && ` · ${c.warnings.length} warning${c.warnings.length === 1 ? '' : 's'}`}
          </p>
        </div>
        <div className="flex flex-wrap items-center gap-2">
          {link && (
            <ButtonLink to={link} variant="secondary" aria-label={`Reopen ${c.title}`}>
              <FolderOpen className="size-4" aria-hidden />
              Reopen
            </ButtonLink>
          )}
          <ConfirmStep
            label={`Delete ${c.title}`}
            question={`Delete “${c.title}” for good?`}
            confirmLabel="Yes, delete"
            keepLabel="Keep it"
            busy={remove.isPending}
            onConfirm={() =>
              remove.mutate(c.id, {
                onSuccess: () => toast.success('Saved result deleted'),
                onError: (err) => toast.error(err.message),
              })
            }
          >
            <Trash2 className="size-4" aria-hidden />
            Delete
          </ConfirmStep>
        </div>
      </Card>
    </li>
  );
}

/** The signed-in apprentice's saved results, newest first. */
export function SavedCalculationList() {
  const { data, error, isPending } = useCalculations();
  if (isPending) return <Loading label="Loading your saved results…" />;
  if (error) return <ErrorNotice error={error} title="Your saved results could not be loaded" />;
  if (data.length === 0) {
    return (
      <EmptyState title="No saved results yet">
        Work something out with a calculator and press “Save result” to keep it here.
      </EmptyState>
    );
  }
  return (
    <ul className="space-y-3">
      {data.map((c) => (
        <SavedItem key={c.id} calculation={c} />
      ))}
    </ul>
  );
}
