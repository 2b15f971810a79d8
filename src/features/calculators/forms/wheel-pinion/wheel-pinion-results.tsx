import type { z } from 'zod';
import type { WheelPinionInput, WheelPinionResults } from '@shared/calc/wheel-pinion';
import type { CalcOutput } from '@shared/calc/types';
import { useCalcForm } from '../../components/calculator-context';
import { MeshDrawing } from '../../components/drawings/mesh-drawing';
import { ResultLine, ResultList, ResultRow } from '../../components/result-row';

const FORUM = 'NAWCC forum "Cycloidal Gears Blanks", post by A. Wolff, quoted as the BS-type rule';

function Unverified() {
  return (
    <span className="ml-1 rounded-sm border border-rework/50 px-1 text-xs font-semibold uppercase tracking-wide text-rework">
      unverified
    </span>
  );
}

export function WheelPinionResultsView({
  output,
  input,
}: {
  output: CalcOutput<WheelPinionResults>;
  input: z.output<typeof WheelPinionInput>;
}) {
  const { unitSystem } = useCalcForm();
  const r = output.results;
  const lantern = input.pinionKind === 'lantern';
  const leafRule =
    input.pinionLeaves < 10 ? 'm(z + 1.71), for pinions under 10 leaves' : 'm(z + 1.61), for 10–16 leaves';
  return (
    <>
      <ResultList>
        <ResultRow label="Centre distance" value={r.centreDistanceMm} quantity="length" main />
        <ResultRow label="Ratio (wheel turns the pinion)" value={r.ratio} quantity="ratio" unit=": 1" significant={5} />
        <ResultRow label="Wheel pitch diameter" value={r.wheelPitchDiameterMm} quantity="length" significant={5} />
        <ResultRow label="Pinion pitch diameter" value={r.pinionPitchDiameterMm} quantity="length" significant={5} />
        <ResultRow
          label="Wheel blank diameter"
          value={r.wheelBlankDiameterMm}
          quantity="length"
          significant={5}
          note={`Rule m(z + 2.76), for wheels of 17 teeth or more: ${FORUM}.${lantern ? ' Wheels driving lantern pinions are said to want a rounder addendum (Goodrich, reported second-hand); this rule is still used.' : ''}`}
        />
        <ResultRow
          label={lantern ? 'Pinion outside diameter, over the trundles' : 'Pinion blank diameter'}
          value={r.pinionBlankDiameterMm}
          quantity="length"
          significant={5}
          note={
            lantern
              ? 'Pitch diameter plus one trundle: the trundle centres lie on the pitch circle (AWCI "Clockmaking standard: Lantern pinion depthing").'
              : `Rule ${leafRule}: ${FORUM}.`
          }
        />
        <ResultRow
          label="Wheel addendum"
          value={r.wheelAddendumMm}
          quantity="length"
          note="1.38 m, half the blank allowance of the rule above: from a forum post, not a published standard."
        />
        <ResultRow
          label={lantern ? 'Trundle half-diameter above the pitch circle' : 'Pinion addendum'}
          value={r.pinionAddendumMm}
          quantity="length"
        />
        {r.goodrichWheelAddendumMm !== null && (
          <ResultRow
            label="Goodrich's wheel addendum, for comparison"
            value={r.goodrichWheelAddendumMm}
            quantity="length"
            note="7/20 of the pinion pitch radius, stated for the 8-leaf pinion: W. L. Goodrich, The Modern Clock (1905). For other counts the forum rule above governs."
          />
        )}
        <ResultRow label="Circular pitch" value={r.circularPitchMm} quantity="length" />
        <ResultRow label="Tooth space at the pitch circle" value={r.toothSpaceMm} quantity="length" />
        {lantern && (
          <>
            <ResultRow
              label="Play of a tooth between the trundles"
              value={r.trundleBacklashMm}
              quantity="length"
              note="Tooth space less the trundle; at least a tenth of the tooth space is asked for (common practice, no source)."
            />
            <ResultLine label="Trundle in the tooth space">
              <span className={r.trundleFits ? 'text-ink' : 'font-semibold text-error'}>
                {r.trundleFits ? 'fits' : (r.trundleBacklashMm ?? 0) > 0 ? 'too tight' : 'does not fit'}
              </span>
            </ResultLine>
          </>
        )}
      </ResultList>
      <p className="mt-3 text-sm text-muted">
        The blank rules come from a forum post, not from BS 978-2 itself. The standard's own proportions (practical
        addendum about 0.95 of the theoretical, leaf thickness 1.05–1.25 m, dedenda with about 0.4 m clearance) are
        known here only from memory: <Unverified /> and not used. Obtain BS 978-2 before relying on them.
      </p>
      <div className="mt-4 print:break-inside-avoid">
        <MeshDrawing sizes={r} unitSystem={unitSystem} />
      </div>
    </>
  );
}
