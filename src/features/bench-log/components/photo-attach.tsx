import { Camera, X } from 'lucide-react';
import { useId, useRef } from 'react';
import { MAX_LOG_PHOTOS } from '@shared/schemas/log-entry';
import type { UploadDTO } from '@shared/schemas/upload';
import { ProgressBar } from '@/components/ui/states';
import { ApiError } from '@/lib/api-client';
import { uploadPhoto } from '../api/upload-photo';

export interface PhotoSlot {
  key: string;
  name: string;
  progress: number;
  upload?: UploadDTO;
  error?: string;
}

export const slotsFromUploads = (uploads: UploadDTO[]): PhotoSlot[] =>
  uploads.map((u) => ({ key: `u${u.id}`, name: `Photo ${u.id}`, progress: 1, upload: u }));

/** Photos go up as soon as they are chosen, each with its own progress bar; the entry attaches the stored ids. */
export function PhotoAttach({
  slots,
  onChange,
  error,
}: {
  slots: PhotoSlot[];
  onChange: (update: (slots: PhotoSlot[]) => PhotoSlot[]) => void;
  error?: string;
}) {
  const inputId = useId();
  const input = useRef<HTMLInputElement>(null);
  const room = MAX_LOG_PHOTOS - slots.length;

  function send(file: File) {
    const key = `${Date.now()}-${Math.random().toString(36).slice(2)}`;
    const patch = (fields: Partial<PhotoSlot>) =>
      onChange((all) => all.map((s) => (s.key === key ? { ...s, ...fields } : s)));
    onChange((all) => [...all, { key, name: file.name, progress: 0 }]);
    uploadPhoto(file, (progress) => patch({ progress }))
      .then((upload) => patch({ upload, progress: 1 }))
      .catch((err: unknown) =>
        patch({ error: err instanceof ApiError ? err.message : 'The photo could not be uploaded.' }),
      );
  }

  return (
    <fieldset className="space-y-2">
      <legend className="text-sm font-semibold text-ink">Photos</legend>
      {slots.length > 0 && (
        <ul className="grid grid-cols-2 gap-3 sm:grid-cols-4">
          {slots.map((s) => (
            <li key={s.key} className="relative rounded-md border border-rule bg-white p-2">
              {s.upload ? (
                <img
                  src={s.upload.thumbUrl}
                  alt={`Attached photo: ${s.name}`}
                  className="h-24 w-full rounded object-cover"
                />
              ) : (
                <div className="flex h-24 flex-col justify-center gap-2 text-sm text-muted">
                  <span className="truncate">{s.name}</span>
                  {s.error ? (
                    <span role="alert" className="text-error">
                      {s.error}
                    </span>
                  ) : (
                    <ProgressBar value={s.progress} label={`Uploading ${s.name}`} />
                  )}
                </div>
              )}
              <button
                type="button"
                onClick={() => onChange((all) => all.filter((x) => x.key !== s.key))}
                className="absolute top-1 right-1 inline-flex size-11 items-center justify-center rounded-full bg-card/90 text-ink hover:text-error"
                aria-label={`Remove ${s.name}`}
              >
                <X className="size-4" aria-hidden />
              </button>
            </li>
          ))}
        </ul>
      )}
      {room > 0 && (
        <label
          htmlFor={inputId}
          className="inline-flex min-h-11 cursor-pointer items-center gap-2 rounded-md border border-dashed border-rule bg-card px-4 text-sm font-semibold text-steel hover:border-brass"
        >
          <Camera className="size-4" aria-hidden />
          Add photos
          <input
            ref={input}
            id={inputId}
            type="file"
            accept="image/*"
            multiple
            className="sr-only"
            onChange={(e) => {
              for (const file of Array.from(e.target.files ?? []).slice(0, room)) send(file);
              if (input.current) input.current.value = '';
            }}
          />
        </label>
      )}
      {error && (
        <p role="alert" className="text-sm font-medium text-error">
          {error}
        </p>
      )}
    </fieldset>
  );
}
