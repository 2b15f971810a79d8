import { ArrowDown, ArrowUp, ImagePlus, RotateCcw, Trash2 } from 'lucide-react';
import { useId, useRef, useState, type DragEvent } from 'react';
import { toast } from 'sonner';
import { MAX_PHOTOS } from '@shared/schemas/submission';
import { Button, buttonClass } from '@/components/ui/button';
import { ProgressBar } from '@/components/ui/states';
import type { PhotoTrayState } from './use-photo-tray';

/** The photos of a piece: add, watch each upload, caption, put in order, retry or remove. */
export function PhotoTray({ tray }: { tray: PhotoTrayState }) {
  const inputId = useId();
  const [announcement, setAnnouncement] = useState('');
  const [dragging, setDragging] = useState(false);
  const buttons = useRef(new Map<string, HTMLButtonElement>());

  const addFiles = (files: File[]) => {
    const left = tray.add(files);
    if (left > 0) toast.warning(`A piece takes at most ${MAX_PHOTOS} photos; ${left} left out.`);
  };
  const onDrop = (e: DragEvent) => {
    e.preventDefault();
    setDragging(false);
    addFiles([...e.dataTransfer.files]);
  };
  const move = (key: string, index: number, delta: -1 | 1) => {
    tray.move(key, delta);
    setAnnouncement(`Photo moved to position ${index + 1 + delta} of ${tray.photos.length}.`);
    // Keep the keyboard on the same button of the same photo after it moves.
    requestAnimationFrame(() => buttons.current.get(`${key}:${delta}`)?.focus());
  };

  return (
    <section aria-labelledby={`${inputId}-title`} className="space-y-3">
      <div className="flex flex-wrap items-end justify-between gap-2">
        <h2 id={`${inputId}-title`} className="font-serif text-xl font-semibold">
          Photos{' '}
          <span className="num text-base font-normal text-muted">
            {tray.photos.length} of {MAX_PHOTOS}
          </span>
        </h2>
        <p className="text-sm text-muted">
          JPEG, PNG or WebP, up to 20 MB each. The first photo is the one the mentor sees first.
        </p>
      </div>
      <div
        onDragOver={(e) => {
          e.preventDefault();
          setDragging(true);
        }}
        onDragLeave={() => setDragging(false)}
        onDrop={onDrop}
        className={`flex flex-wrap items-center gap-3 rounded-lg border-2 border-dashed p-4 ${dragging ? 'border-steel bg-steel/5' : 'border-rule bg-card/60'}`}
      >
        <input
          id={inputId}
          type="file"
          multiple
          accept="image/jpeg,image/png,image/webp,image/heic,image/heif,.heic"
          className="peer sr-only"
          disabled={tray.photos.length >= MAX_PHOTOS}
          onChange={(e) => {
            addFiles([...(e.target.files ?? [])]);
            e.target.value = '';
          }}
        />
        <label
          htmlFor={inputId}
          className="inline-flex min-h-11 cursor-pointer items-center gap-2 rounded-md border border-rule bg-card px-4 text-sm font-semibold text-ink peer-focus-visible:outline-3 peer-focus-visible:outline-steel peer-disabled:cursor-not-allowed peer-disabled:opacity-50 hover:border-brass"
        >
          <ImagePlus className="size-4" aria-hidden />
          Add photos
        </label>
        <span className="text-sm text-muted">or drop them here.</span>
      </div>
      <p className="sr-only" aria-live="polite">
        {announcement}
      </p>
      {tray.photos.length > 0 && (
        <ol className="space-y-3">
          {tray.photos.map((p, i) => (
            <li key={p.key} className="flex flex-wrap gap-4 rounded-lg border border-rule bg-card p-3 sm:flex-nowrap">
              <img
                src={p.preview}
                alt={p.caption || `Photo ${i + 1}`}
                className="size-28 shrink-0 rounded-md border border-rule bg-paper object-cover"
              />
              <div className="min-w-0 flex-1 space-y-2">
                <p className="flex items-center gap-2 text-sm font-semibold text-ink">
                  <span className="num rounded bg-brass/15 px-2">{i + 1}</span>
                  <span className="truncate">{p.name}</span>
                </p>
                {p.state === 'uploading' && (
                  <div className="space-y-1">
                    <ProgressBar value={p.progress} label={`Uploading photo ${i + 1}`} />
                    <p className="num text-xs text-muted">{Math.round(p.progress * 100)} % uploaded</p>
                  </div>
                )}
                {p.state === 'failed' && (
                  <div role="alert" className="flex flex-wrap items-center gap-2 text-sm text-error">
                    <span>{p.error}</span>
                    {p.file && (
                      <Button variant="secondary" onClick={() => tray.retry(p.key)}>
                        <RotateCcw className="size-4" aria-hidden />
                        Retry photo {i + 1}
                      </Button>
                    )}
                  </div>
                )}
                <label className="block text-sm">
                  <span className="font-semibold text-ink">Caption for photo {i + 1}</span>
                  <input
                    value={p.caption}
                    maxLength={300}
                    onChange={(e) => tray.setCaption(p.key, e.target.value)}
                    placeholder="What this photo shows, e.g. arbor against the square, front face"
                    className="mt-1 block min-h-11 w-full rounded-md border border-rule bg-white px-3 py-2"
                  />
                </label>
              </div>
              <div className="flex shrink-0 gap-1 sm:flex-col">
                {([-1, 1] as const).map((delta) => (
                  <button
                    key={delta}
                    type="button"
                    className={buttonClass('quiet')}
                    ref={(el) => {
                      if (el) buttons.current.set(`${p.key}:${delta}`, el);
                    }}
                    disabled={delta === -1 ? i === 0 : i === tray.photos.length - 1}
                    onClick={() => move(p.key, i, delta)}
                    aria-label={`Move photo ${i + 1} ${delta === -1 ? 'up' : 'down'}`}
                  >
                    {delta === -1 ? (
                      <ArrowUp className="size-4" aria-hidden />
                    ) : (
                      <ArrowDown className="size-4" aria-hidden />
                    )}
                  </button>
                ))}
                <Button variant="quiet" onClick={() => tray.remove(p.key)} aria-label={`Remove photo ${i + 1}`}>
                  <Trash2 className="size-4" aria-hidden />
                </Button>
              </div>
            </li>
          ))}
        </ol>
      )}
    </section>
  );
}
