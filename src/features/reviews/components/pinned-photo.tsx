import { ExternalLink } from 'lucide-react';
import { useState } from 'react';
import type { PinDTO, SubmissionPhotoDTO } from '@shared/schemas/submission';
import { PinMarker } from './pin-marker';

/** A photo as reviewed: the mentor's pins drawn on it, each pin's note a click (or a tab) away. */
export function PinnedPhoto({ photo, index, pins }: { photo: SubmissionPhotoDTO; index: number; pins: PinDTO[] }) {
  const [open, setOpen] = useState<number | null>(null);
  const label = photo.caption || `Photo ${index + 1}`;
  return (
    <figure className="space-y-2">
      <div className="relative overflow-hidden rounded-md border border-rule bg-paper">
        <img
          src={photo.viewUrl}
          alt={label}
          width={photo.width}
          height={photo.height}
          loading="lazy"
          className="block h-auto w-full"
        />
        {pins.map((p) => (
          <PinMarker
            key={p.id}
            number={p.number}
            x={p.x}
            y={p.y}
            active={open === p.number}
            aria-label={`Pin ${p.number}: ${p.note}`}
            aria-expanded={open === p.number}
            onClick={() => setOpen(open === p.number ? null : p.number)}
          />
        ))}
      </div>
      {open !== null && (
        <p className="rounded-md border border-steel/30 bg-steel/5 p-2 text-sm" aria-live="polite">
          <span className="num font-semibold">Pin {open}:</span> {pins.find((p) => p.number === open)?.note}
        </p>
      )}
      <figcaption className="flex flex-wrap items-center justify-between gap-2 text-sm text-muted">
        <span>
          <span className="num font-semibold text-ink">{index + 1}.</span> {photo.caption || 'No caption'}
        </span>
        <a href={photo.url} target="_blank" rel="noreferrer" className="inline-flex min-h-11 items-center gap-1">
          Full size{' '}
          <span className="num">
            ({photo.width} × {photo.height} px)
          </span>
          <ExternalLink className="size-4" aria-hidden />
        </a>
      </figcaption>
    </figure>
  );
}
