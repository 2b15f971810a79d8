import { fileTypeFromBuffer } from 'file-type';
import sharp from 'sharp';
import { UPLOAD_EDGE, type UploadSize } from '@shared/schemas/upload';
import { AppError } from '../../lib/app-error';

const ACCEPTED = new Set(['image/jpeg', 'image/png', 'image/webp']);
const HEIC = new Set(['image/heic', 'image/heif', 'image/heic-sequence', 'image/heif-sequence']);
/**
 * 50 megapixels: above what phone cameras make (12 to 48), low enough that a tiny crafted file (a flat PNG of
 * 10,000 x 10,000 is 12 KB) is refused from its header, before any pixel is decoded.
 */
export const MAX_INPUT_PIXELS = 50_000_000;
/** A genuine photo decodes in well under a second; one that is still decoding after this is not worth the core. */
const DECODE_TIMEOUT_SECONDS = 10;

interface ProcessedImage {
  sourceType: string;
  width: number;
  height: number;
  files: Record<UploadSize, Buffer>;
}

const refuse = (message: string) => new AppError('UNSUPPORTED_TYPE', message, 415);

/**
 * Judges the type from the bytes, then re-encodes the picture into three JPEG copies with the orientation applied.
 * sharp writes no metadata unless asked to, so camera, GPS and time tags do not survive; nothing is written to disk here.
 */
export async function processImage(bytes: Buffer): Promise<ProcessedImage> {
  const type = await fileTypeFromBuffer(bytes);
  const mime = type?.mime ?? 'unknown';
  const heic = HEIC.has(mime);
  if (!ACCEPTED.has(mime) && !heic) {
    throw refuse('Only photographs in JPEG, PNG or WebP can be uploaded. This file is not one of them.');
  }
  try {
    const files = await encodeSizes(bytes);
    return { sourceType: mime, width: files.width, height: files.height, files: files.files };
  } catch (err) {
    throw decodeFailure(err, heic);
  }
}

/** What to tell the person when sharp gives up on their file. */
export function decodeFailure(err: unknown, heic = false): AppError {
  const message = err instanceof Error ? err.message : '';
  if (/pixel limit/i.test(message)) {
    return new AppError('IMAGE_TOO_LARGE', 'That picture has more than 50 megapixels. Send a smaller copy.', 413);
  }
  if (/^timeout/i.test(message)) {
    return new AppError('IMAGE_TOO_LARGE', 'That picture takes too long to read. Send a smaller or simpler copy.', 413);
  }
  if (heic) {
    return refuse(
      'HEIC photos cannot be read here. Export the photo as JPEG (most phones and photo apps offer this) and upload it again.',
    );
  }
  return refuse('That file looks like a picture but could not be read. It may be damaged; try exporting it again.');
}

type Raw = { data: Buffer; info: { width: number; height: number; channels: number } };
const rawInput = (r: Raw) => ({
  raw: { width: r.info.width, height: r.info.height, channels: r.info.channels as 1 | 2 | 3 | 4 },
});
const fit = (edge: number) => ({ width: edge, height: edge, fit: 'inside' as const, withoutEnlargement: true });
const JPEG = { quality: 84, mozjpeg: false, optimiseCoding: false } as const;

/**
 * The photo is decoded once, turned upright and reduced to the full size as raw pixels; the smaller sizes are made from
 * those pixels rather than by decoding the file again. That keeps a 12-megapixel photo well under a second.
 */
async function encodeSizes(bytes: Buffer) {
  const full: Raw = await sharp(bytes, { failOn: 'error', limitInputPixels: MAX_INPUT_PIXELS })
    .timeout({ seconds: DECODE_TIMEOUT_SECONDS })
    .rotate()
    .flatten({ background: '#ffffff' })
    .toColourspace('srgb')
    .resize(fit(UPLOAD_EDGE.full))
    .raw({ depth: 'uchar' })
    .toBuffer({ resolveWithObject: true });
  const view: Raw = await sharp(full.data, rawInput(full))
    .resize(fit(UPLOAD_EDGE.view))
    .raw()
    .toBuffer({ resolveWithObject: true });
  const [fullJpeg, viewJpeg, thumbJpeg] = await Promise.all([
    sharp(full.data, rawInput(full)).jpeg(JPEG).toBuffer(),
    sharp(view.data, rawInput(view)).jpeg(JPEG).toBuffer(),
    sharp(view.data, rawInput(view)).resize(fit(UPLOAD_EDGE.thumb)).jpeg(JPEG).toBuffer(),
  ]);
  const files: Record<UploadSize, Buffer> = { full: fullJpeg, view: viewJpeg, thumb: thumbJpeg };
  return { width: full.info.width, height: full.info.height, files };
}
