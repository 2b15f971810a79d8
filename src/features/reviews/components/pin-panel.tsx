import { Trash2 } from 'lucide-react';
import { useState } from 'react';
import type { SubmissionPhotoDTO } from '@shared/schemas/submission';
import { Button } from '@/components/ui/button';
import { PinBoard, type DraftPin } from './pin-board';

interface Props {
  photos: SubmissionPhotoDTO[];
  pins: DraftPin[];
  onChange: (pins: DraftPin[]) => void;
}

let counter = 0;

/** The photos of the version under review, one large at a time, with the pins and their notes listed beneath. */
export function PinPanel({ photos, pins, onChange }: Props) {
  const [current, setCurrent] = useState(0);
  const [activeKey, setActiveKey] = useState<string | null>(null);
  const photo = photos[current];
  const numbered = pins.map((p, i) => ({ ...p, number: i + 1 }));
  const photoIndex = new Map(photos.map((p, i) => [p.uploadId, i]));

  const add = (x: number, y: number) => {
    const key = `pin-${++counter}`;
    onChange([...pins, { key, uploadId: photo.uploadId, x, y, note: '' }]);
    setActiveKey(key);
  };
  const update = (key: string, change: Partial<DraftPin>) =>
    onChange(pins.map((p) => (p.key === key ? { ...p, ...change } : p)));
  const remove = (key: string) => onChange(pins.filter((p) => p.key !== key));
  const select = (key: string) => {
    setActiveKey(key);
    const target = pins.find((p) => p.key === key);
    if (target) setCurrent(photoIndex.get(target.uploadId) ?? current);
    document.getElementById(`note-${key}`)?.focus();
  };

  return (
    <div className="space-y-4">
      {photos.length > 1 && (
        <div role="group" aria-label="Choose a photo" className="flex flex-wrap gap-2">
          {photos.map((p, i) => (
            <button
              key={p.uploadId}
              type="button"
              aria-pressed={i === current}
              aria-label={`Photo ${i + 1}${p.caption ? `: ${p.caption}` : ''}`}
              onClick={() => setCurrent(i)}
              className={`relative rounded-md border-2 ${i === current ? 'border-steel' : 'border-transparent'}`}
            >
              <img src={p.thumbUrl} alt="" className="size-20 rounded object-cover" />
              <span className="num absolute top-1 left-1 rounded bg-ink/70 px-1 text-xs text-white">{i + 1}</span>
            </button>
          ))}
        </div>
      )}
      <PinBoard
        photo={photo}
        index={current}
        pins={numbered.filter((p) => p.uploadId === photo.uploadId)}
        activeKey={activeKey}
        onAdd={add}
        onMove={(key, x, y) => update(key, { x, y })}
        onSelect={select}
      />
      <section aria-labelledby="pins-title" className="space-y-2">
        <h3 id="pins-title" className="font-serif text-lg font-semibold">
          Pins <span className="num text-base font-normal text-muted">({pins.length})</span>
        </h3>
        {pins.length === 0 && (
          <p className="text-sm text-muted">Click on a photo where your feedback applies to drop a numbered pin.</p>
        )}
        <ol className="space-y-2">
          {numbered.map((p) => (
            <li
              key={p.key}
              className={`flex gap-3 rounded-md border p-2 ${p.key === activeKey ? 'border-steel bg-steel/5' : 'border-rule bg-card'}`}
            >
              <button
                type="button"
                onClick={() => select(p.key)}
                className="num flex size-9 shrink-0 items-center justify-center rounded-full bg-error text-sm font-semibold text-white"
                aria-label={`Show pin ${p.number} on photo ${(photoIndex.get(p.uploadId) ?? 0) + 1}`}
              >
                {p.number}
              </button>
              <label className="min-w-0 flex-1 text-sm">
                <span className="font-semibold">
                  Note for pin {p.number}{' '}
                  <span className="font-normal text-muted">(photo {(photoIndex.get(p.uploadId) ?? 0) + 1})</span>
                </span>
                <textarea
                  id={`note-${p.key}`}
                  rows={2}
                  maxLength={1000}
                  value={p.note}
                  autoFocus={p.key === activeKey && !p.note}
                  onFocus={() => setActiveKey(p.key)}
                  onChange={(e) => update(p.key, { note: e.target.value })}
                  aria-invalid={!p.note.trim()}
                  className="mt-1 block w-full rounded-md border border-rule bg-white px-2 py-1 aria-[invalid=true]:border-error"
                  placeholder="What is at this spot, e.g. a burr left at the edge of the oil sink"
                />
              </label>
              <Button variant="quiet" onClick={() => remove(p.key)} aria-label={`Remove pin ${p.number}`}>
                <Trash2 className="size-4" aria-hidden />
              </Button>
            </li>
          ))}
        </ol>
      </section>
    </div>
  );
}
