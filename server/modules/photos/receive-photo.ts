import type { RequestHandler } from 'express';
import type { Config } from '../../config';
import { receiveOneFile } from '../../lib/receive-one-file';
import { sizeLabel } from '../basemaps/receive-upload';

/**
 * Receive one photo (field `file`) into memory, at most `PHOTO_MAX_BYTES` long: a photo is read
 * whole to be checked and re-encoded anyway, and nothing half-written is left on disk.
 */
export function receivePhoto(config: Config): RequestHandler {
  return receiveOneFile({
    maxBytes: config.PHOTO_MAX_BYTES,
    fields: 2,
    fieldSize: 1024,
    chooseOne: 'Choose a photo to upload',
    tooLarge: `The photo is larger than the ${sizeLabel(config.PHOTO_MAX_BYTES)} allowed`,
    what: 'photo',
  });
}
