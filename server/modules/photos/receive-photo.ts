import type { RequestHandler } from 'express';
import multer from 'multer';
import type { Config } from '../../config';
import { AppError } from '../../errors';
import { sizeLabel } from '../basemaps/receive-upload';
import { readsMultipart } from '../../middleware/validate';

const chooseOne = 'Choose a photo to upload';
const oneFile = 'Send one photo, in the field "file"';

/**
 * Receive one photo (field `file`) into memory, at most `PHOTO_MAX_BYTES` long: a photo is read
 * whole to be checked and re-encoded anyway, and nothing half-written is left on disk.
 */
export function receivePhoto(config: Config): RequestHandler {
  const upload = multer({
    storage: multer.memoryStorage(),
    limits: { fileSize: config.PHOTO_MAX_BYTES, files: 1, fields: 2, parts: 3, fieldSize: 1024 },
    defParamCharset: 'utf8',
  }).single('file');

  return readsMultipart((req, res, next) => {
    upload(req, res, (err: unknown) => {
      if (!err) {
        if (!req.file)
          return next(new AppError(400, 'invalid-input', chooseOne, { file: chooseOne }));
        return next();
      }
      // Whatever else the form parser throws (no boundary, a truncated body) is the client's
      // malformed request, not our failure.
      if (!(err instanceof multer.MulterError))
        return next(
          new AppError(
            400,
            'bad-upload',
            'The upload could not be read: send a multipart form with the photo in the field "file"',
          ),
        );
      if (err.code === 'LIMIT_FILE_SIZE')
        return next(
          new AppError(
            413,
            'file-too-large',
            `The photo is larger than the ${sizeLabel(config.PHOTO_MAX_BYTES)} allowed`,
          ),
        );
      if (err.code === 'LIMIT_UNEXPECTED_FILE' || err.code === 'LIMIT_FILE_COUNT')
        return next(new AppError(400, 'invalid-input', oneFile, { file: oneFile }));
      next(err);
    });
  });
}
