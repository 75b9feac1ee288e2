// Photos for species cards. The type is read from the file's first bytes, never from its
// name or the browser's claim; the image is then decoded, turned upright, shrunk to at
// most 1600 px and re-encoded by sharp, which writes no metadata unless asked to — so
// EXIF (camera, time, GPS location), XMP and ICC profiles are not kept.
import { createHash } from 'node:crypto';
import sharp from 'sharp';
import { invalid } from './errors';

export const MAX_PHOTO_BYTES = 5 * 1024 * 1024;
export const MAX_PHOTO_EDGE = 1600;
/** Refuse decompression bombs: a small file that decodes to a vast image. */
const MAX_INPUT_PIXELS = 40_000_000;

type Kind = 'image/jpeg' | 'image/png';

// JPEG starts FF D8 FF; PNG with its 8-byte signature (ISO/IEC 10918-1; RFC 2083 §3.1).
const PNG_SIGNATURE = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);

export function sniffImage(bytes: Buffer): Kind | null {
  if (bytes.length >= 3 && bytes[0] === 0xff && bytes[1] === 0xd8 && bytes[2] === 0xff) return 'image/jpeg';
  if (bytes.length >= 8 && bytes.subarray(0, 8).equals(PNG_SIGNATURE)) return 'image/png';
  return null;
}

export type ProcessedPhoto = {
  data: Buffer;
  contentType: Kind;
  width: number;
  height: number;
  sha256: string;
};

const notAnImage = () =>
  invalid('That file is not a JPEG or PNG image. Choose a photo saved as .jpg or .png.', {
    photo: 'Not a JPEG or PNG image (checked from the file itself, not its name)',
  });

export async function processPhoto(bytes: Buffer): Promise<ProcessedPhoto> {
  const contentType = sniffImage(bytes);
  if (!contentType) throw notAnImage();
  try {
    const pipeline = sharp(bytes, { failOn: 'error', limitInputPixels: MAX_INPUT_PIXELS })
      .rotate()
      .resize({ width: MAX_PHOTO_EDGE, height: MAX_PHOTO_EDGE, fit: 'inside', withoutEnlargement: true });
    const encoded =
      contentType === 'image/jpeg'
        ? pipeline.jpeg({ quality: 82, mozjpeg: true })
        : pipeline.png({ compressionLevel: 9 });
    const { data, info } = await encoded.toBuffer({ resolveWithObject: true });
    return {
      data,
      contentType,
      width: info.width,
      height: info.height,
      sha256: createHash('sha256').update(data).digest('hex'),
    };
  } catch (err) {
    if (/pixel limit/i.test((err as Error).message)) {
      const message = `The image is larger than ${MAX_INPUT_PIXELS / 1_000_000} megapixels; export a smaller copy`;
      throw invalid(message, { photo: message });
    }
    // A damaged file that only starts like an image.
    throw notAnImage();
  }
}
