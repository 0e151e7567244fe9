import { fileTypeFromBuffer } from 'file-type';
import sharp from 'sharp';
import { AppError } from '../../errors';
import {
  PHOTO_THUMB_PX,
  photoContentTypes,
  type PhotoContentType,
} from '../../../shared/schemas/photo';

/** Longest side kept of a photo; a larger one is scaled down on upload. */
const MAX_SIDE_PX = 4096;
/** A decoded image past this many pixels is refused before it takes the memory it asks for. */
const MAX_INPUT_PIXELS = 60_000_000;

const extensions: Record<PhotoContentType, string> = {
  'image/jpeg': 'jpg',
  'image/png': 'png',
  'image/webp': 'webp',
};

export interface ProcessedPhoto {
  contentType: PhotoContentType;
  extension: string;
  full: Buffer;
  width: number;
  height: number;
  /** Always WebP. */
  thumb: Buffer;
}

const unreadable = () =>
  new AppError(400, 'unreadable-photo', 'The photo could not be read: it may be damaged', {
    file: 'The photo could not be read: it may be damaged',
  });

/**
 * What is stored of an uploaded photo. Its type comes from its bytes (a name or a declared type
 * says nothing); it is decoded and written again, turned upright by its EXIF orientation, so that
 * nothing of the camera's metadata (GPS position, time, device, owner) is kept; and a thumbnail
 * is made beside it.
 */
export async function processPhoto(upload: Buffer): Promise<ProcessedPhoto> {
  const detected = await fileTypeFromBuffer(upload);
  const contentType = photoContentTypes.find((t) => t === detected?.mime);
  if (!contentType)
    throw new AppError(415, 'unsupported-photo-type', 'Send a photo as a JPEG, PNG or WebP image', {
      file: 'Send a photo as a JPEG, PNG or WebP image',
    });

  try {
    const upright = () =>
      sharp(upload, { limitInputPixels: MAX_INPUT_PIXELS, failOn: 'error' }).rotate();
    const scaled = upright().resize(MAX_SIDE_PX, MAX_SIDE_PX, {
      fit: 'inside',
      withoutEnlargement: true,
    });
    // sharp writes no metadata unless asked to (keepMetadata, withMetadata): none is asked.
    const encoded =
      contentType === 'image/jpeg'
        ? scaled.jpeg({ quality: 85, mozjpeg: true })
        : contentType === 'image/png'
          ? scaled.png()
          : scaled.webp({ quality: 85 });
    const [full, thumb] = await Promise.all([
      encoded.toBuffer({ resolveWithObject: true }),
      upright()
        .resize(PHOTO_THUMB_PX, PHOTO_THUMB_PX, { fit: 'inside', withoutEnlargement: true })
        .webp({ quality: 75 })
        .toBuffer(),
    ]);
    return {
      contentType,
      extension: extensions[contentType],
      full: full.data,
      width: full.info.width,
      height: full.info.height,
      thumb,
    };
  } catch (err) {
    if (/pixel limit/i.test(String((err as Error)?.message)))
      throw new AppError(413, 'photo-too-large', 'The photo has more pixels than allowed');
    throw unreadable();
  }
}
