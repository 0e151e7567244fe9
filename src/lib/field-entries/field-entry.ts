import type { Measurement, MeasurementInput } from '@shared/schemas/measurement';
import type { SapEntry, SapEntryInput } from '@shared/schemas/sap';
import type { Taphole, TapholeInput } from '@shared/schemas/taphole';
import type { WeatherDay, WeatherDayInput } from '@shared/schemas/weather';

/**
 * What a forester or a tapper records in the woods or at the tank: a reading, a drilled hole, a
 * day's sap or a day's weather (the last two for a stand, not a tree). Each carries an
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
    }
  | {
      kind: 'sap';
      clientId: string;
      sugarbushId: number;
      input: SapEntryInput;
    }
  | {
      kind: 'weather';
      clientId: string;
      sugarbushId: number;
      input: WeatherDayInput;
    };

export type FieldEntryResult = Measurement | Taphole | SapEntry | WeatherDay;

export const fieldEntryKeys = {
  all: ['field-entry'] as const,
};

export const newClientId = (): string => crypto.randomUUID();
