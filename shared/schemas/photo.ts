import { z } from 'zod';

/** The image types a photo may be, decided from the file's bytes, never from its name. */
export const photoContentTypes = ['image/jpeg', 'image/png', 'image/webp'] as const;
export type PhotoContentType = (typeof photoContentTypes)[number];

/** `GET /api/photos/:photoId?size=thumb` serves the small copy made at upload. */
export const photoQuerySchema = z.object({ size: z.enum(['full', 'thumb']).default('full') });
export type PhotoQuery = z.output<typeof photoQuerySchema>;

/** Longest side of the thumbnail, in pixels. */
export const PHOTO_THUMB_PX = 320;

export interface Photo {
  id: number;
  sugarbushId: number;
  treeId: number | null;
  noteId: number | null;
  contentType: PhotoContentType;
  width: number;
  height: number;
  byteSize: number;
  uploadedById: number | null;
  uploadedByName: string | null;
  createdAt: string;
  /** The stored image, served to members of the stand only. */
  url: string;
  thumbUrl: string;
}
