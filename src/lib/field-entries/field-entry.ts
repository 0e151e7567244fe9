import type { Measurement, MeasurementInput } from '@shared/schemas/measurement';
import type { Taphole, TapholeInput } from '@shared/schemas/taphole';

/**
 * What a forester or a tapper records in the woods: a reading or a drilled hole. Each carries an
 * id made on the device (`clientId`, a UUID), so sending it twice stores it once on the server.
 * Entries are sent through mutations under `fieldEntryKeys.all`, which can wait for the network
 * and survive a reload.
 */
export type FieldEntry =
  | {
      kind: 'measurement';
      clientId: string;
      treeId: number;
      tag: string;
      input: MeasurementInput;
    }
  | {
      kind: 'taphole';
      clientId: string;
      treeId: number;
      tag: string;
      input: TapholeInput;
    };

export type FieldEntryResult = Measurement | Taphole;

export const fieldEntryKeys = {
  all: ['field-entry'] as const,
};

export const newClientId = (): string => crypto.randomUUID();
