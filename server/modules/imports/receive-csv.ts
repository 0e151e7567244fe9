import type { RequestHandler } from 'express';
import type { Config } from '../../config';
import { receiveOneFile } from '../../lib/receive-one-file';
import { sizeLabel } from '../basemaps/receive-upload';

/**
 * Receive one CSV file (field `file`, at most `IMPORT_MAX_BYTES`) into memory, and the optional
 * text field `mapping`. The file is read whole by a worker anyway (CSV or GPX), and nothing is left on disk.
 */
export function receiveCsv(config: Config): RequestHandler {
  return receiveOneFile({
    maxBytes: config.IMPORT_MAX_BYTES,
    fields: 2,
    fieldSize: 64 * 1024,
    chooseOne: 'Choose a CSV (or, for trees, GPX) file to import',
    tooLarge: `The file is larger than the ${sizeLabel(config.IMPORT_MAX_BYTES)} an import takes: split it`,
    what: 'file',
  });
}
