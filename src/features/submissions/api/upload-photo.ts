import { UploadDTO } from '@shared/schemas/upload';
import { uploadWithProgress } from '@/lib/api-client';

/** One photo through the shared upload pipeline, reporting progress from 0 to 1. */
export function uploadPhoto(file: File, onProgress: (fraction: number) => void, signal?: AbortSignal) {
  const form = new FormData();
  form.append('file', file);
  return uploadWithProgress('/uploads', form, UploadDTO, onProgress, signal);
}
