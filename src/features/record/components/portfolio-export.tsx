import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { ErrorNotice } from '@/components/ui/states';
import { downloadPortfolio } from '../api/download-portfolio';

const megabytes = (bytes: number) => `${(bytes / (1024 * 1024)).toFixed(1)} MB`;

/** Builds the portfolio ZIP (a PDF of the record and the photos) and shows how much has arrived while it streams. */
export function PortfolioExport({ apprenticeId }: { apprenticeId: number }) {
  const [state, setState] = useState<
    | { step: 'idle' }
    | { step: 'working'; bytes: number }
    | { step: 'done'; bytes: number }
    | { step: 'failed'; error: unknown }
  >({ step: 'idle' });
  const start = async () => {
    setState({ step: 'working', bytes: 0 });
    try {
      const bytes = await downloadPortfolio(apprenticeId, (received) => setState({ step: 'working', bytes: received }));
      setState({ step: 'done', bytes });
    } catch (error) {
      setState({ step: 'failed', error });
    }
  };
  return (
    <section aria-labelledby="portfolio" className="space-y-2">
      <h2 id="portfolio" className="font-serif text-2xl font-semibold">
        Portfolio
      </h2>
      <p className="max-w-prose text-muted">
        A ZIP to take away: a PDF of every skill with its standard, the evidence with its photos, scores, comments and
        pins, the sign-offs and the bench hours by week, and the photos themselves.
      </p>
      <Button variant="secondary" busy={state.step === 'working'} onClick={start}>
        Export portfolio
      </Button>
      <p role="status" aria-live="polite" className="text-sm text-muted">
        {state.step === 'working' &&
          (state.bytes === 0 ? 'Preparing the portfolio…' : `Preparing… ${megabytes(state.bytes)} received so far`)}
        {state.step === 'done' && `Portfolio ready: ${megabytes(state.bytes)}, saved to your downloads.`}
      </p>
      {state.step === 'failed' && <ErrorNotice error={state.error} title="The portfolio could not be prepared" />}
    </section>
  );
}
