import { Download } from 'lucide-react';
import { useRef } from 'react';
import { createPortal } from 'react-dom';
import type { z } from 'zod';
import type { PlantingInput, PlantingResults } from '@shared/calc/planting';
import type { CalcOutput } from '@shared/calc/types';
import { Button } from '@/components/ui/button';
import { useCalcForm } from '../../components/calculator-context';
import { PlantingDrawing } from '../../components/drawings/planting-drawing';
import { plantingFileName, saveSvg } from '../../lib/save-svg';
import { DepthsTable, DrillingTable, ProblemsList } from './planting-tables';

export function PlantingResultsView({
  output,
  input,
}: {
  output: CalcOutput<PlantingResults>;
  input: z.output<typeof PlantingInput>;
}) {
  const { unitSystem } = useCalcForm();
  const svg = useRef<SVGSVGElement>(null);
  const r = output.results;
  const drawing = { results: r, datum: input.datum, unitSystem };
  return (
    <div className="space-y-5">
      <ProblemsList problems={r.problems} />
      <DrillingTable results={r} datum={input.datum} />
      <DepthsTable depths={r.depths} />
      {r.arbors.length > 0 && (
        <>
          <div className="space-y-3 print:hidden">
            <h3 className="font-serif text-lg font-semibold">Layout, to scale</h3>
            <PlantingDrawing {...drawing} svgRef={svg} />
            <Button variant="secondary" onClick={() => svg.current && saveSvg(svg.current, plantingFileName())}>
              <Download className="size-4" aria-hidden />
              Download SVG
            </Button>
          </div>
          {/* The page's two-column print layout would squeeze a 1:1 drawing, so the printed copy goes on a page of
              its own after everything else. */}
          {createPortal(
            <section className="hidden break-before-page p-0 text-ink print:block" aria-hidden>
              <h2 className="mb-2 font-serif text-lg font-semibold">Planting layout at 1:1</h2>
              <PlantingDrawing {...drawing} testId="planting-drawing-print" />
            </section>,
            document.body,
          )}
        </>
      )}
    </div>
  );
}
