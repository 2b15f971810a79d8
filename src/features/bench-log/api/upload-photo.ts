import { UploadDTO } from '@shared/schemas/upload';
import { uploadWithProgress } from '@/lib/api-client';

/** Sends one photo through the shared upload pipeline; the reply's id is what an entry attaches. */
export function uploadPhoto(file: File, onProgress: (fraction: number) => void, signal?: AbortSignal) {
  const form = new FormData();
  form.append('file', file);
  return uploadWithProgress('/uploads', form, UploadDTO, onProgress, signal);
}
