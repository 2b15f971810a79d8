import type { FuseeResults } from '@shared/calc/fusee';
import { useCalcForm } from '../../components/calculator-context';
import { decimalsIn, formatFixed, formatNumber, toDisplay, unitLabel } from '../../lib/units';

interface Props {
  readings: { massG: number; distanceMm: number }[];
  results: Pick<FuseeResults, 'torqueCurve' | 'radiiMm' | 'fuseeTorqueNmm' | 'chainTensionN'>;
}

/**
 * Per turn: the reading, the spring torque it means, the fusee radius that evens it (to 0.01 mm, what a fusee is cut
 * to), and, once the chain radius is known, the chain's pull and what reaches the arbor.
 */
export function RadiiTable({ readings, results }: Props) {
  const { unitSystem } = useCalcForm();
  const length = (mm: number) => formatNumber(toDisplay(mm, 'length', unitSystem), 4);
  const radius = (mm: number) => formatFixed(toDisplay(mm, 'length', unitSystem), decimalsIn('length', unitSystem, 2));
  const pull = results.fuseeTorqueNmm.length > 0;
  const mass = (g: number) => formatNumber(toDisplay(g, 'mass', unitSystem), 4);
  const lengthUnit = unitLabel('length', unitSystem);
  const massUnit = unitLabel('mass', unitSystem);
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-sm" aria-labelledby="fusee-radii-title">
        <caption id="fusee-radii-title" className="pb-2 text-left font-serif text-lg font-semibold text-ink">
          Fusee radii, turn by turn
        </caption>
        <thead>
          <tr className="border-b border-rule text-left align-bottom">
            <th scope="col" className="py-1 pr-2">
              Turn
            </th>
            <th scope="col" className="py-1 pr-2">
              Reading
            </th>
            <th scope="col" className="py-1 pr-2 text-right">
              Spring torque (N·mm)
            </th>
            <th scope="col" className="py-1 pr-2 text-right">
              Fusee radius ({lengthUnit})
            </th>
            {pull && (
              <>
                <th scope="col" className="py-1 pr-2 text-right">
                  Chain pull (N)
                </th>
                <th scope="col" className="py-1 text-right">
                  At the fusee arbor (N·mm)
                </th>
              </>
            )}
          </tr>
        </thead>
        <tbody className="num">
          {results.radiiMm.map((r, i) => (
            <tr key={i} className="border-b border-rule/60" data-testid="radius-row">
              <td className="py-1 pr-2">{i + 1}</td>
              <td className="py-1 pr-2">
                {mass(readings[i].massG)} {massUnit} at {length(readings[i].distanceMm)} {lengthUnit}
              </td>
              <td className="py-1 pr-2 text-right">{formatNumber(results.torqueCurve[i].springTorqueNmm, 4)}</td>
              <td className="py-1 pr-2 text-right font-semibold">{radius(r)}</td>
              {pull && (
                <>
                  <td className="py-1 pr-2 text-right">{formatNumber(results.chainTensionN[i], 4)}</td>
                  <td className="py-1 text-right">{formatNumber(results.fuseeTorqueNmm[i], 4)}</td>
                </>
              )}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
