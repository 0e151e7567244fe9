import type { RequestHandler } from 'express';
import multer from 'multer';
import type { Config } from '../../config';
import { AppError } from '../../errors';
import { readsMultipart } from '../../middleware/validate';
import { sizeLabel } from '../basemaps/receive-upload';

const chooseOne = 'Choose a station’s daily summaries CSV file to import';

/**
 * Receive one station file (field `file`, at most `IMPORT_MAX_BYTES`) into memory, with the text
 * fields `unit` and `dryRun`. A station's file is small (a row a day); nothing is left on disk.
 */
export function receiveStationFile(config: Config): RequestHandler {
  const upload = multer({
    storage: multer.memoryStorage(),
    limits: { fileSize: config.IMPORT_MAX_BYTES, files: 1, fields: 2, parts: 3, fieldSize: 1024 },
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
            `The file is larger than the ${sizeLabel(config.IMPORT_MAX_BYTES)} an import takes: download fewer years`,
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
