import { springTemper } from '@shared/calc/spring-temper';
import { BRASS_TEMPERS } from '@shared/calc/spring-temper-tables';
import { formatNumber } from '../../lib/units';

// The formula column comes from the calculator itself, so the table and the result can never disagree.
const reduction = (numbersHard: number) => {
  const { results } = springTemper.compute({ mode: 'brass', numbersHard });
  return results.mode === 'brass' ? results.reductionPercent : NaN;
};

/** The named tempers of cartridge brass with their reductions and strengths; the current one is marked. */
export function BrassTable({ current }: { current: string }) {
  return (
    <div className="mt-4 overflow-x-auto">
      <table className="w-full border-collapse text-sm">
        <caption className="mb-2 text-left text-muted">
          Numbers hard to temper: reductions from Precision Steel Warehouse, strengths of C26000 strip from Olin Brass.
        </caption>
        <thead>
          <tr className="border-b border-rule text-left">
            <th scope="col" className="py-1 pr-2">
              Temper
            </th>
            <th scope="col" className="py-1 pr-2 text-right">
              Numbers
            </th>
            <th scope="col" className="py-1 pr-2 text-right">
              Published
            </th>
            <th scope="col" className="py-1 pr-2 text-right">
              Formula
            </th>
            <th scope="col" className="py-1 pr-2 text-right">
              Tensile
            </th>
            <th scope="col" className="py-1 text-right">
              Yield
            </th>
          </tr>
        </thead>
        <tbody>
          {BRASS_TEMPERS.map((t) => (
            <tr
              key={t.name}
              aria-current={t.name === current ? 'true' : undefined}
              className="border-b border-rule/70 aria-[current=true]:bg-brass/15 aria-[current=true]:font-semibold"
            >
              <th scope="row" className="py-1 pr-2 text-left font-normal">
                {t.name}
              </th>
              <td className="num py-1 pr-2 text-right">{t.numbersHard}</td>
              <td className="num py-1 pr-2 text-right">
                {t.publishedReductionPercent === null ? '—' : `${t.publishedReductionPercent} %`}
              </td>
              <td className="num py-1 pr-2 text-right">{formatNumber(reduction(t.numbersHard))} %</td>
              <td className="num py-1 pr-2 text-right">
                {t.strength.tensileMPa.min}–{t.strength.tensileMPa.max} MPa
              </td>
              <td className="num py-1 text-right">{t.strength.yieldMPa} MPa</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
