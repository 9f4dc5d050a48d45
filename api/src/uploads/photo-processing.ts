import sharp, { type Metadata, type Sharp } from 'sharp';
import { UPLOAD_IMAGE_FORMATS, type UploadImageFormat } from './upload-kinds';

/** Larger images are refused before they are decoded (a small file can hold a huge image). */
export const MAX_INPUT_PIXELS = 40_000_000;

/** The thumbnail fits in a square of this side (WebP). */
export const THUMBNAIL_MAX_PX = 320;

export const NOT_AN_IMAGE_REASON =
  'is not a JPEG, PNG or WebP image (checked by its content, not its name)';
export const DAMAGED_IMAGE_REASON =
  'could not be read as an image: the file is damaged or cut short';

export const MIME_TYPES: Record<UploadImageFormat, string> = {
  jpeg: 'image/jpeg',
  png: 'image/png',
  webp: 'image/webp',
};

export const FILE_EXTENSIONS: Record<UploadImageFormat, string> = {
  jpeg: 'jpg',
  png: 'png',
  webp: 'webp',
};

export interface ProcessedPhoto {
  format: UploadImageFormat;
  /** Re-encoded in its own format, turned upright, with no metadata (EXIF, GPS, XMP, ICC). */
  original: Buffer;
  /** Of the upright original. */
  widthPx: number;
  heightPx: number;
  /** WebP, at most THUMBNAIL_MAX_PX on its longer side. */
  thumbnail: Buffer;
}

export type PhotoCheck = { ok: true; photo: ProcessedPhoto } | { ok: false; reason: string };

function isAcceptedFormat(format: string | undefined): format is UploadImageFormat {
  return UPLOAD_IMAGE_FORMATS.some((accepted) => accepted === format);
}

function decoder(input: Buffer): Sharp {
  // Only the first frame of an animated image; a cut-off file is refused rather than padded.
  return sharp(input, { limitInputPixels: MAX_INPUT_PIXELS, failOn: 'truncated', pages: 1 });
}

function encode(image: Sharp, format: UploadImageFormat): Sharp {
  switch (format) {
    case 'jpeg':
      return image.jpeg({ quality: 90, mozjpeg: true });
    case 'png':
      return image.png({ compressionLevel: 9 });
    case 'webp':
      return image.webp({ quality: 90 });
  }
}

/**
 * Checks a photo by its content and makes what is stored: the format is read from the bytes
 * (never from the name or the declared type); the original is decoded and written again by
 * sharp, which drops every metadata block (sharp keeps none unless asked), after turning it
 * upright by its EXIF orientation; the thumbnail is a small WebP.
 */
export async function processPhoto(input: Buffer): Promise<PhotoCheck> {
  let metadata: Metadata;
  try {
    metadata = await sharp(input).metadata();
  } catch {
    return { ok: false, reason: NOT_AN_IMAGE_REASON };
  }
  if (!isAcceptedFormat(metadata.format)) return { ok: false, reason: NOT_AN_IMAGE_REASON };
  const format = metadata.format;
  const width = metadata.width ?? 0;
  const height = metadata.height ?? 0;
  if (width * height > MAX_INPUT_PIXELS) {
    return {
      ok: false,
      reason: `is ${width} × ${height} pixels; at most ${MAX_INPUT_PIXELS / 1_000_000} megapixels are accepted`,
    };
  }
  try {
    const original = await encode(decoder(input).autoOrient(), format).toBuffer({
      resolveWithObject: true,
    });
    const thumbnail = await decoder(input)
      .autoOrient()
      .resize(THUMBNAIL_MAX_PX, THUMBNAIL_MAX_PX, { fit: 'inside', withoutEnlargement: true })
      .webp({ quality: 80 })
      .toBuffer();
    return {
      ok: true,
      photo: {
        format,
        original: original.data,
        widthPx: original.info.width,
        heightPx: original.info.height,
        thumbnail,
      },
    };
  } catch {
    return { ok: false, reason: DAMAGED_IMAGE_REASON };
  }
}

/**
 * The name the browser sent, for display only: without any folder part, control or format
 * characters, runs of white space, and at most 120 characters.
 */
export function cleanOriginalName(name: string | undefined): string {
  if (!name) return '';
  const base = name.split(/[\\/]/).pop() ?? '';
  const cleaned = base
    .normalize('NFC')
    .replace(/\s+/g, ' ')
    .replace(/[\p{Cc}\p{Cf}]/gu, '')
    .trim();
  return Array.from(cleaned).slice(0, 120).join('');
}
