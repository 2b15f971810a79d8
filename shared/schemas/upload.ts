import * as z from 'zod/mini';

export const UPLOAD_MAX_BYTES = 20 * 1024 * 1024;
export const UPLOAD_SIZES = ['full', 'view', 'thumb'] as const;
export const UploadSize = z.enum(UPLOAD_SIZES);
export type UploadSize = z.infer<typeof UploadSize>;
/** Longest side in pixels of each stored copy. */
export const UPLOAD_EDGE: Record<UploadSize, number> = { full: 3200, view: 1600, thumb: 400 };

/** A stored photo; width and height are those of the full copy (orientation applied). */
export const UploadDTO = z.object({
  id: z.int(),
  width: z.int(),
  height: z.int(),
  url: z.string(),
  viewUrl: z.string(),
  thumbUrl: z.string(),
});
export type UploadDTO = z.infer<typeof UploadDTO>;

export const UploadSizeQuery = z.object({ size: z._default(UploadSize, 'full') });

/** How much of a person's photo storage is filled, all stored sizes counted. */
export const StorageUsage = z.object({ usedBytes: z.int().check(z.gte(0)), quotaBytes: z.int().check(z.positive()) });
export type StorageUsage = z.infer<typeof StorageUsage>;
