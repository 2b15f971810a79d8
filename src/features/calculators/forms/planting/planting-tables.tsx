import type { PlantingResults } from '@shared/calc/planting';
import { useCalcForm } from '../../components/calculator-context';
import { formatNumber, toDisplay, unitLabel } from '../../lib/units';

const th = 'py-1 pr-2 text-right';
const td = 'py-1 pr-2 text-right';

/** Where to drill each hole, from the datum lines and (when it is not their crossing) from the datum point. */
export function DrillingTable({ results, datum }: { results: PlantingResults; datum: { x: number; y: number } }) {
  const { unitSystem } = useCalcForm();
  const len = (mm: number) => formatNumber(toDisplay(mm, 'length', unitSystem), 6);
  const unit = unitLabel('length', unitSystem);
  const offset = datum.x !== 0 || datum.y !== 0;
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-sm">
        <caption className="pb-2 text-left font-serif text-lg font-semibold text-ink">Drilling coordinates</caption>
        <thead>
          <tr className="border-b border-rule text-left align-bottom">
            <th scope="col" className="py-1 pr-2">
              Arbor
            </th>
            <th scope="col" className={th}>
              X ({unit})
            </th>
            <th scope="col" className={th}>
              Y ({unit})
            </th>
            {offset && (
              <>
                <th scope="col" className={th}>
                  X from datum point ({unit})
                </th>
                <th scope="col" className={th}>
                  Y from datum point ({unit})
                </th>
              </>
            )}
          </tr>
        </thead>
        <tbody className="num">
          {results.arbors.map((a) => (
            <tr key={a.name} className="border-b border-rule/60" data-testid="drilling-row">
              <th scope="row" className="py-1 pr-2 text-left font-sans font-semibold">
                {a.name}
              </th>
              <td className={td}>{len(a.x)}</td>
              <td className={td}>{len(a.y)}</td>
              {offset && (
                <>
                  <td className={td}>{len(a.fromDatum.x)}</td>
                  <td className={td}>{len(a.fromDatum.y)}</td>
                </>
              )}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

/** Each centre distance used, with its direction: what the depthing tool should confirm. */
export function DepthsTable({ depths }: { depths: PlantingResults['depths'] }) {
  const { unitSystem } = useCalcForm();
  if (depths.length === 0) return null;
  const unit = unitLabel('length', unitSystem);
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-sm">
        <caption className="pb-2 text-left font-serif text-lg font-semibold text-ink">Depths</caption>
        <thead>
          <tr className="border-b border-rule text-left align-bottom">
            <th scope="col" className="py-1 pr-2">
              From → to
            </th>
            <th scope="col" className={th}>
              Centre distance ({unit})
            </th>
            <th scope="col" className={th}>
              Angle from the X datum line (°)
            </th>
          </tr>
        </thead>
        <tbody className="num">
          {depths.map((d) => (
            <tr key={`${d.from}>${d.to}`} className="border-b border-rule/60">
              <th scope="row" className="py-1 pr-2 text-left font-sans font-normal">
                {d.from} → {d.to}
              </th>
              <td className={td}>{formatNumber(toDisplay(d.distanceMm, 'length', unitSystem), 6)}</td>
              <td className={td}>{formatNumber(d.angleDeg, 5)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

/** Arbors the calculator would not place, each with its reason, rather than a point in the wrong place. */
export function ProblemsList({ problems }: { problems: PlantingResults['problems'] }) {
  if (problems.length === 0) return null;
  return (
    <div role="alert" className="rounded-md border border-error/40 bg-error/5 p-3 text-sm">
      <p className="font-semibold text-error">
        {problems.length === 1 ? 'One arbor could not be placed' : `${problems.length} arbors could not be placed`}
      </p>
      <ul className="mt-1 list-disc space-y-1 pl-6 text-ink">
        {problems.map((p, i) => (
          <li key={i} data-testid="planting-problem">
            <strong>{p.arbor}</strong>: {p.reason}
          </li>
        ))}
      </ul>
    </div>
  );
}
