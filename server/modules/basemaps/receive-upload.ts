import crypto from 'node:crypto';
import fs from 'node:fs';
import type { RequestHandler } from 'express';
import multer from 'multer';
import type { Config } from '../../config';
import { AppError } from '../../errors';
import { readsMultipart } from '../../middleware/validate';

/** Remove a file if it is there; a file already gone is fine. */
export function removeQuietly(file: string | undefined) {
  if (file) fs.rmSync(file, { force: true });
}

export function sizeLabel(bytes: number): string {
  if (bytes >= 2 ** 20) return `${Number((bytes / 2 ** 20).toFixed(1))} MB`;
  if (bytes >= 2 ** 10) return `${Number((bytes / 2 ** 10).toFixed(1))} KB`;
  return `${bytes} bytes`;
}

/**
 * Receive one MBTiles upload (field `file`, optional text field `name`) into a temporary file in
 * `BASEMAP_DIR`, at most `BASEMAP_MAX_BYTES` long. Whatever goes wrong, no partial file stays.
 */
export function receiveBasemap(config: Config): RequestHandler {
  const upload = multer({
    storage: multer.diskStorage({
      destination: config.BASEMAP_DIR,
      filename: (_req, _file, cb) => cb(null, `upload-${crypto.randomUUID()}.part`),
    }),
    limits: { fileSize: config.BASEMAP_MAX_BYTES, files: 1, fields: 4, parts: 6, fieldSize: 1024 },
    defParamCharset: 'utf8',
  }).single('file');

  return readsMultipart((req, res, next) => {
    upload(req, res, (err: unknown) => {
      if (!err) {
        if (!req.file)
          return next(
            new AppError(400, 'invalid-input', 'Choose an MBTiles file to upload', {
              file: 'Choose an MBTiles file to upload',
            }),
          );
        return next();
      }
      removeQuietly(req.file?.path);
      // Anything else the form parser throws (no boundary, a truncated body, a bad part header)
      // is the client's malformed request, not our failure.
      if (!(err instanceof multer.MulterError))
        return next(
          new AppError(
            400,
            'bad-upload',
            'The upload could not be read: send a multipart form with the file in the field "file"',
          ),
        );
      if (err.code === 'LIMIT_FILE_SIZE')
        return next(
          new AppError(
            413,
            'file-too-large',
            `The file is larger than the ${sizeLabel(config.BASEMAP_MAX_BYTES)} allowed for a basemap`,
          ),
        );
      if (err.code === 'LIMIT_UNEXPECTED_FILE' || err.code === 'LIMIT_FILE_COUNT')
        return next(
          new AppError(400, 'invalid-input', 'Send one MBTiles file, in the field "file"', {
            file: 'Send one MBTiles file, in the field "file"',
          }),
        );
      next(err);
    });
  });
}
