import type { RequestHandler } from 'express';
import multer from 'multer';
import type { Config } from '../../config';
import { AppError } from '../../errors';
import { sizeLabel } from '../basemaps/receive-upload';
import { readsMultipart } from '../../middleware/validate';

const chooseOne = 'Choose a CSV (or, for trees, GPX) file to import';

/**
 * Receive one CSV file (field `file`, at most `IMPORT_MAX_BYTES`) into memory, and the optional
 * text field `mapping`. The file is read whole by a worker anyway (CSV or GPX), and nothing is left on disk.
 */
export function receiveCsv(config: Config): RequestHandler {
  const upload = multer({
    storage: multer.memoryStorage(),
    limits: {
      fileSize: config.IMPORT_MAX_BYTES,
      files: 1,
      fields: 2,
      parts: 3,
      fieldSize: 64 * 1024,
    },
    defParamCharset: 'utf8',
  }).single('file');

  return readsMultipart((req, res, next) => {
    upload(req, res, (err: unknown) => {
      if (!err) {
        if (!req.file)
          return next(new AppError(400, 'invalid-input', chooseOne, { file: chooseOne }));
        return next();
      }
      if (err instanceof multer.MulterError && err.code === 'LIMIT_FILE_SIZE')
        return next(
          new AppError(
            413,
            'file-too-large',
            `The file is larger than the ${sizeLabel(config.IMPORT_MAX_BYTES)} an import takes: split it`,
          ),
        );
      if (!(err instanceof multer.MulterError))
        return next(
          new AppError(
            400,
            'bad-upload',
            'The upload could not be read: send a multipart form with the file in the field "file"',
          ),
        );
      next(err);
    });
  });
}
