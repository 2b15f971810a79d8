import type { ButtonHTMLAttributes } from 'react';

/** A numbered pin at a fraction of the photo's width and height; it lands on the same spot at every size and zoom. */
export function PinMarker({
  number,
  x,
  y,
  active,
  className = '',
  ...rest
}: { number: number; x: number; y: number; active?: boolean } & ButtonHTMLAttributes<HTMLButtonElement>) {
  return (
    <button
      type="button"
      style={{ left: `${x * 100}%`, top: `${y * 100}%` }}
      className={`num absolute z-10 flex size-8 -translate-x-1/2 -translate-y-1/2 items-center justify-center rounded-full border-2 border-white text-sm font-semibold text-white shadow-[0_0_0_2px_rgba(31,35,40,0.6)] ${active ? 'bg-steel ring-4 ring-steel/40' : 'bg-error'} ${className}`}
      {...rest}
    >
      {number}
    </button>
  );
}
