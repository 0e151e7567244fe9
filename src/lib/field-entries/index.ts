export { fieldEntryKeys, newClientId, type FieldEntry, type FieldEntryResult } from './field-entry';
export {
  registerFieldEntryDefaults,
  refreshAfterFieldEntry,
  sendFieldEntry,
} from './send-field-entry';
export { useSendFieldEntry } from './use-send-field-entry';
