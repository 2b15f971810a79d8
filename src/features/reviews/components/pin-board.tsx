import { Crosshair, ZoomIn } from 'lucide-react';
import { useId, useRef, useState, type KeyboardEvent, type MouseEvent, type PointerEvent } from 'react';
import type { SubmissionPhotoDTO } from '@shared/schemas/submission';
import { Button } from '@/components/ui/button';
import { PinMarker } from './pin-marker';

export interface DraftPin {
  key: string;
  uploadId: number;
  x: number;
  y: number;
  note: string;
}

interface Props {
  photo: SubmissionPhotoDTO;
  index: number;
  /** The pins on this photo, with their numbers across the whole review. */
  pins: (DraftPin & { number: number })[];
  activeKey: string | null;
  onAdd: (x: number, y: number) => void;
  onMove: (key: string, x: number, y: number) => void;
  onSelect: (key: string) => void;
}

const clamp = (v: number) => Math.min(1, Math.max(0, v));

/**
 * One photo large, zoomable up to four times, where a click drops a numbered pin. Pins are kept as fractions of the
 * picture, so zooming moves nothing. From the keyboard: drop a pin at the centre, then move it with the arrow keys.
 */
export function PinBoard({ photo, index, pins, activeKey, onAdd, onMove, onSelect }: Props) {
  const zoomId = useId();
  const [zoom, setZoom] = useState(100);
  const label = photo.caption || `Photo ${index + 1}`;

  const surface = useRef<HTMLDivElement>(null);
  const drag = useRef<{ key: string; x: number; y: number; moved: boolean } | null>(null);
  const justDragged = useRef(false);
  const fraction = (clientX: number, clientY: number) => {
    const box = surface.current!.getBoundingClientRect();
    return [clamp((clientX - box.left) / box.width), clamp((clientY - box.top) / box.height)] as const;
  };
  // A pin can be dragged to correct where it was dropped; a press without movement is an ordinary click.
  const dragStart = (key: string, e: PointerEvent<HTMLButtonElement>) => {
    e.currentTarget.setPointerCapture(e.pointerId);
    drag.current = { key, x: e.clientX, y: e.clientY, moved: false };
  };
  const dragMove = (key: string, e: PointerEvent<HTMLButtonElement>) => {
    const d = drag.current;
    if (!d || d.key !== key) return;
    if (!d.moved && Math.hypot(e.clientX - d.x, e.clientY - d.y) < 4) return;
    d.moved = true;
    onMove(key, ...fraction(e.clientX, e.clientY));
  };
  const pressEnd = () => {
    justDragged.current = Boolean(drag.current?.moved);
    drag.current = null;
  };
  const choose = (key: string) => {
    if (justDragged.current) justDragged.current = false;
    else onSelect(key);
  };

  const drop = (e: MouseEvent<HTMLImageElement>) => {
    const box = e.currentTarget.getBoundingClientRect();
    onAdd(clamp((e.clientX - box.left) / box.width), clamp((e.clientY - box.top) / box.height));
  };
  const nudge = (pin: DraftPin, e: KeyboardEvent) => {
    const step = e.shiftKey ? 0.05 : 0.005;
    const delta = { ArrowLeft: [-step, 0], ArrowRight: [step, 0], ArrowUp: [0, -step], ArrowDown: [0, step] }[e.key];
    if (!delta) return;
    e.preventDefault();
    onMove(pin.key, clamp(pin.x + delta[0]), clamp(pin.y + delta[1]));
  };

  return (
    <div className="space-y-2">
      <div className="flex flex-wrap items-center gap-3">
        <label htmlFor={zoomId} className="flex items-center gap-2 text-sm font-semibold">
          <ZoomIn className="size-4" aria-hidden />
          Zoom
        </label>
        <input
          id={zoomId}
          type="range"
          min={100}
          max={400}
          step={25}
          value={zoom}
          onChange={(e) => setZoom(Number(e.target.value))}
          aria-valuetext={`${zoom} percent`}
          className="h-11 w-40 accent-steel"
        />
        <span className="num w-14 text-sm">{zoom} %</span>
        <Button variant="secondary" onClick={() => onAdd(0.5, 0.5)}>
          <Crosshair className="size-4" aria-hidden />
          Drop a pin at the centre
        </Button>
      </div>
      <div className="max-h-[70vh] overflow-auto rounded-md border border-rule bg-ink/5">
        <div ref={surface} className="relative" style={{ width: `${zoom}%` }}>
          {/* The click is a pointer shortcut; the button above and the arrow keys on a pin do the same from the keyboard. */}
          <img
            src={zoom > 150 ? photo.url : photo.viewUrl}
            alt={`${label}. Click on the photo to drop a pin.`}
            width={photo.width}
            height={photo.height}
            draggable={false}
            onClick={drop}
            className="block h-auto w-full cursor-crosshair select-none"
          />
          {pins.map((p) => (
            <PinMarker
              key={p.key}
              number={p.number}
              x={p.x}
              y={p.y}
              active={p.key === activeKey}
              aria-label={`Pin ${p.number}${p.note ? `: ${p.note}` : ''}. Drag it, or use the arrow keys to move it; Shift moves it further.`}
              onPointerDown={(e) => dragStart(p.key, e)}
              onPointerMove={(e) => dragMove(p.key, e)}
              onPointerUp={pressEnd}
              onClick={() => choose(p.key)}
              onKeyDown={(e) => nudge(p, e)}
              className="cursor-grab touch-none active:cursor-grabbing"
            />
          ))}
        </div>
      </div>
      <p className="text-sm text-muted">
        <span className="num font-semibold text-ink">{index + 1}.</span> {photo.caption || 'No caption'}{' '}
        <span className="num">
          ({photo.width} × {photo.height} px)
        </span>
      </p>
    </div>
  );
}
