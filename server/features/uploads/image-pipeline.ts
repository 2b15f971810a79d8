import { fileTypeFromBuffer } from 'file-type';
import sharp, { type Sharp } from 'sharp';
import { UPLOAD_EDGE, UPLOAD_SIZES, type UploadSize } from '@shared/schemas/upload';
import { AppError } from '../../lib/app-error';

const ACCEPTED = new Set(['image/jpeg', 'image/png', 'image/webp']);
const HEIC = new Set(['image/heic', 'image/heif', 'image/heic-sequence', 'image/heif-sequence']);
/** About 100 megapixels: far above any camera photo, low enough that a crafted file cannot exhaust memory. */
const MAX_INPUT_PIXELS = 100_000_000;

export interface ProcessedImage {
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
  const source = sharp(bytes, { failOn: 'error', limitInputPixels: MAX_INPUT_PIXELS }).rotate();
  try {
    const outputs = await Promise.all(UPLOAD_SIZES.map((size) => encode(source.clone(), UPLOAD_EDGE[size])));
    const [full] = outputs;
    return {
      sourceType: mime,
      width: full.info.width,
      height: full.info.height,
      files: Object.fromEntries(UPLOAD_SIZES.map((size, i) => [size, outputs[i].data])) as Record<UploadSize, Buffer>,
    };
  } catch (err) {
    if (heic)
      throw refuse(
        'HEIC photos cannot be read here. Export the photo as JPEG (most phones and photo apps offer this) and upload it again.',
      );
    if (err instanceof Error && /pixel limit/i.test(err.message)) {
      throw new AppError('IMAGE_TOO_LARGE', 'That picture has more than 100 megapixels. Send a smaller copy.', 413);
    }
    throw refuse('That file looks like a picture but could not be read. It may be damaged; try exporting it again.');
  }
}

function encode(pipeline: Sharp, edge: number) {
  return pipeline
    .resize({ width: edge, height: edge, fit: 'inside', withoutEnlargement: true })
    .flatten({ background: '#ffffff' })
    .jpeg({ quality: 84, mozjpeg: false, chromaSubsampling: '4:2:0' })
    .toBuffer({ resolveWithObject: true });
}
