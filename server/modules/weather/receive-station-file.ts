import type { RequestHandler } from 'express';
import type { Config } from '../../config';
import { receiveOneFile } from '../../lib/receive-one-file';
import { sizeLabel } from '../basemaps/receive-upload';

/**
 * Receive one station file (field `file`, at most `IMPORT_MAX_BYTES`) into memory, with the text
 * fields `unit` and `dryRun`. A station's file is small (a row a day); nothing is left on disk.
 */
export function receiveStationFile(config: Config): RequestHandler {
  return receiveOneFile({
    maxBytes: config.IMPORT_MAX_BYTES,
    fields: 2,
    fieldSize: 1024,
    chooseOne: 'Choose a station’s daily summaries CSV file to import',
    tooLarge: `The file is larger than the ${sizeLabel(config.IMPORT_MAX_BYTES)} an import takes: download fewer years`,
    what: 'file',
  });
}
