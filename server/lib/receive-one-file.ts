import type { RequestHandler } from 'express';
import multer from 'multer';
import { AppError } from '../errors';
import { readsMultipart } from '../middleware/validate';

export interface OneFileUpload {
  /** The largest file taken (413 beyond it). */
  maxBytes: number;
  /** Text fields beside the file, and the longest one. */
  fields: number;
  fieldSize: number;
  /** Said when the form holds no file: "Choose a photo to upload". */
  chooseOne: string;
  /** Said on 413: "The photo is larger than the 10 MiB allowed". */
  tooLarge: string;
  /** What the file is, for "send a multipart form with the photo in the field "file"". */
  what: string;
}

/**
 * Receive one file in the field `file` into memory (read whole by what checks it anyway; nothing
 * half-written is left on disk), with a few short text fields. Every way the form can be wrong is
 * the client's: 400 with a field message, 413 when the file is too large; never a 5xx.
 */
export function receiveOneFile(upload: OneFileUpload): RequestHandler {
  const parse = multer({
    storage: multer.memoryStorage(),
    limits: {
      fileSize: upload.maxBytes,
      files: 1,
      fields: upload.fields,
      parts: upload.fields + 1,
      fieldSize: upload.fieldSize,
    },
    defParamCharset: 'utf8',
  }).single('file');
  const oneFile = `Send one ${upload.what}, in the field "file"`;

  return readsMultipart((req, res, next) => {
    parse(req, res, (err: unknown) => {
      if (!err) {
        if (!req.file)
          return next(
            new AppError(400, 'invalid-input', upload.chooseOne, { file: upload.chooseOne }),
          );
        return next();
      }
      // Whatever else the form parser throws (no boundary, a truncated body) is a malformed
      // request, not our failure.
      if (!(err instanceof multer.MulterError))
        return next(
          new AppError(
            400,
            'bad-upload',
            `The upload could not be read: send a multipart form with the ${upload.what} in the field "file"`,
          ),
        );
      if (err.code === 'LIMIT_FILE_SIZE')
        return next(new AppError(413, 'file-too-large', upload.tooLarge));
      if (err.code === 'LIMIT_UNEXPECTED_FILE' || err.code === 'LIMIT_FILE_COUNT')
        return next(new AppError(400, 'invalid-input', oneFile, { file: oneFile }));
      next(err);
    });
  });
}
