import type { TemperBand } from '@shared/calc/spring-temper-tables';
import { useCalcForm } from '../../components/calculator-context';
import { formatNumber, toDisplay, unitLabel, withUnit } from '../../lib/units';

export function Swatch({ band }: { band: TemperBand }) {
  return (
    <span
      aria-hidden
      className="inline-block size-4 rounded-sm border border-ink/30 align-[-2px] print:[print-color-adjust:exact]"
      style={{ backgroundColor: band.hex }}
    />
  );
}

/**
 * The chart's colours in order of heat, as swatches. Choosing one looks its temperature up; the band for the typed
 * temperature and the chosen colour are outlined. The swatch colours only suggest the oxide film.
 */
export function TemperSwatches({ bands, marked }: { bands: readonly TemperBand[]; marked: (TemperBand | null)[] }) {
  const { draft, setField, unitSystem } = useCalcForm();
  const unit = unitLabel('temperature', unitSystem);
  return (
    <figure className="mt-4">
      <figcaption className="mb-2 text-sm text-muted">
        Temper colours on bright carbon steel (Sheffield Gauge Plate chart). Choose one to look up its temperature.
      </figcaption>
      <ul className="grid grid-cols-3 gap-1.5 sm:grid-cols-4">
        {bands.map((b) => {
          const isMarked = marked.some((m) => m?.name === b.name);
          return (
            <li key={b.name}>
              <button
                type="button"
                aria-pressed={draft.colour === b.name}
                onClick={() => setField('colour', draft.colour === b.name ? '' : b.name)}
                className={`flex min-h-11 w-full flex-col items-start rounded-md border p-1.5 text-left text-xs ${
                  isMarked ? 'border-ink ring-2 ring-steel' : 'border-rule'
                }`}
              >
                <span
                  aria-hidden
                  className="mb-1 block h-5 w-full rounded-sm print:[print-color-adjust:exact]"
                  style={{ backgroundColor: b.hex }}
                />
                <span className="font-semibold text-ink">{b.name}</span>
                <span className="num text-muted">
                  {withUnit(formatNumber(toDisplay(b.tempC, 'temperature', unitSystem)), unit)}
                  {b.note ? ` · ${b.note}` : ''}
                </span>
              </button>
            </li>
          );
        })}
      </ul>
    </figure>
  );
}
