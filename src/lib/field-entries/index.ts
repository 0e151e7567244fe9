export { fieldEntryKeys, newClientId, type FieldEntry, type FieldEntryResult } from './field-entry';
export {
  fieldEntryScope,
  isRefusal,
  registerFieldEntryDefaults,
  refreshAfterFieldEntry,
  sendFieldEntry,
} from './send-field-entry';
export { refusedEntries, useRefusedEntries, type RefusedEntry } from './refused-entries';
export { useSendFieldEntry, useWaitingFieldEntries } from './use-send-field-entry';
export { useFormFieldEntry, type FormSendCallbacks } from './use-form-field-entry';
