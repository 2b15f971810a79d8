import { useCallback, useEffect, useRef, useState } from 'react';
import { MAX_PHOTOS, type SubmissionPhotoDTO } from '@shared/schemas/submission';
import { UPLOAD_MAX_BYTES } from '@shared/schemas/upload';
import { ApiError } from '@/lib/api-client';
import { uploadPhoto } from '../api/upload-photo';

interface TrayPhoto {
  key: string;
  name: string;
  caption: string;
  /** What the tray shows: the local file while it uploads, the stored thumbnail once it is in. */
  preview: string;
  state: 'uploading' | 'ready' | 'failed';
  progress: number;
  error?: string;
  file?: File;
  uploadId?: number;
}

let counter = 0;
const nextKey = () => `photo-${++counter}`;
const fromStored = (p: SubmissionPhotoDTO): TrayPhoto => ({
  key: nextKey(),
  name: p.caption || `Photo ${p.position}`,
  caption: p.caption,
  preview: p.thumbUrl,
  state: 'ready',
  progress: 1,
  uploadId: p.uploadId,
});

/**
 * The photos of a draft while it is edited: each new file uploads on its own with its own progress, a failed one can be
 * retried alone, and the order is the order the mentor will see.
 */
export function usePhotoTray(initial: SubmissionPhotoDTO[]) {
  const [photos, setPhotos] = useState<TrayPhoto[]>(() => initial.map(fromStored));
  const aborts = useRef(new Map<string, AbortController>());
  const objectUrls = useRef(new Set<string>());

  useEffect(() => {
    const urls = objectUrls.current;
    const pending = aborts.current;
    return () => {
      pending.forEach((a) => a.abort());
      urls.forEach((u) => URL.revokeObjectURL(u));
    };
  }, []);

  const patch = useCallback((key: string, change: Partial<TrayPhoto>) => {
    setPhotos((list) => list.map((p) => (p.key === key ? { ...p, ...change } : p)));
  }, []);

  const start = useCallback(
    (key: string, file: File) => {
      if (file.size > UPLOAD_MAX_BYTES) {
        patch(key, { state: 'failed', error: 'This photo is over 20 MB. Send a smaller copy.' });
        return;
      }
      const abort = new AbortController();
      aborts.current.set(key, abort);
      patch(key, { state: 'uploading', progress: 0, error: undefined });
      uploadPhoto(file, (progress) => patch(key, { progress }), abort.signal)
        .then((upload) => patch(key, { state: 'ready', progress: 1, uploadId: upload.id }))
        .catch((err: unknown) => {
          if (abort.signal.aborted) return;
          patch(key, {
            state: 'failed',
            error: err instanceof ApiError ? err.message : 'The upload failed. Try again.',
          });
        })
        .finally(() => aborts.current.delete(key));
    },
    [patch],
  );

  /** Adds files up to the limit; returns how many were left out. */
  const add = (files: File[]): number => {
    const room = Math.max(0, MAX_PHOTOS - photos.length);
    const taken = files.slice(0, room).map((file) => {
      const preview = URL.createObjectURL(file);
      objectUrls.current.add(preview);
      return { key: nextKey(), name: file.name, caption: '', preview, state: 'uploading' as const, progress: 0, file };
    });
    setPhotos((list) => [...list, ...taken]);
    taken.forEach((p) => start(p.key, p.file));
    return files.length - taken.length;
  };

  const retry = (key: string) => {
    const photo = photos.find((p) => p.key === key);
    if (photo?.file) start(key, photo.file);
  };

  const remove = (key: string) => {
    aborts.current.get(key)?.abort();
    setPhotos((list) => list.filter((p) => p.key !== key));
  };

  const move = (key: string, delta: -1 | 1) => {
    setPhotos((list) => {
      const from = list.findIndex((p) => p.key === key);
      const to = from + delta;
      if (from < 0 || to < 0 || to >= list.length) return list;
      const next = [...list];
      [next[from], next[to]] = [next[to], next[from]];
      return next;
    });
  };

  const setCaption = (key: string, caption: string) => patch(key, { caption });

  return {
    photos,
    add,
    retry,
    remove,
    move,
    setCaption,
    uploading: photos.some((p) => p.state === 'uploading'),
    failed: photos.some((p) => p.state === 'failed'),
    ready: photos
      .filter((p) => p.state === 'ready' && p.uploadId)
      .map((p) => ({ uploadId: p.uploadId!, caption: p.caption.trim() })),
  };
}

export type PhotoTrayState = ReturnType<typeof usePhotoTray>;
