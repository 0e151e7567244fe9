import { z } from 'zod';
import type { Collection } from '@shared/schemas/enums';
import { sapEntryInputSchema, type SapEntry, type SapEntryInput } from '@shared/schemas/sap';
import { parseDecimal, todayIso } from '@/lib/units';
import {
  fieldText,
  fromCelsius,
  fromLitres,
  toCelsius,
  toLitres,
  type SeasonUnits,
} from './season-units';

/**
 * The sap form as typed: volumes and temperatures in the page's units. Field names follow the
 * payload (`volumeL`, `heldAtC`) so that the server's field errors land on the control they concern.
 */
export interface SapFormValues {
  collectedOn: string;
  /** '' for the whole stand. */
  collection: '' | Collection;
  volumeL: string;
  sugarPct: string;
  heldAtC: string;
  syrupMadeL: string;
  note: string;
}

export const sapFields = [
  'collectedOn',
  'collection',
  'volumeL',
  'sugarPct',
  'heldAtC',
  'syrupMadeL',
  'note',
] as const satisfies readonly (keyof SapFormValues)[];

type NumberField = 'volumeL' | 'sugarPct' | 'heldAtC' | 'syrupMadeL';

const what: Record<NumberField, string> = {
  volumeL: 'volume of sap',
  sugarPct: 'sugar content',
  heldAtC: 'temperature the sap was held at',
  syrupMadeL: 'syrup made',
};

export const blankSapForm = (): SapFormValues => ({
  collectedOn: todayIso(),
  collection: '',
  volumeL: '',
  sugarPct: '',
  heldAtC: '',
  syrupMadeL: '',
  note: '',
});

/** An entry's values back in the form, in the page's units, for a correction. */
export const sapFormFrom = (entry: SapEntry, units: SeasonUnits): SapFormValues => ({
  collectedOn: entry.collectedOn,
  collection: entry.collection ?? '',
  volumeL: fieldText(fromLitres(entry.volumeL, units.volume), 3),
  sugarPct: fieldText(entry.sugarPct, 2),
  heldAtC:
    entry.heldAtC === null ? '' : fieldText(fromCelsius(entry.heldAtC, units.temperature), 1),
  syrupMadeL:
    entry.syrupMadeL === null ? '' : fieldText(fromLitres(entry.syrupMadeL, units.volume), 3),
  note: entry.note ?? '',
});

/**
 * The form's schema: turns what was typed (gallons or litres, °F or °C) into the API's payload
 * in litres and °C, and checks it with the same schema the API uses.
 */
export function sapFormSchema(units: SeasonUnits) {
  return z
    .object({
      collectedOn: z.string(),
      collection: z.enum(['', 'bucket', 'gravity', 'vacuum']),
      volumeL: z.string(),
      sugarPct: z.string(),
      heldAtC: z.string(),
      syrupMadeL: z.string(),
      note: z.string(),
    })
    .transform((values, ctx): SapEntryInput => {
      const typed = {} as Record<NumberField, number | null>;
      const bad = new Set<string>();
      for (const field of Object.keys(what) as NumberField[]) {
        const value = parseDecimal(values[field].replace('\u2212', '-'));
        if (value === undefined) {
          typed[field] = null;
          if (field === 'volumeL' || field === 'sugarPct') {
            ctx.addIssue({ code: 'custom', path: [field], message: `Enter the ${what[field]}` });
            bad.add(field);
          }
        } else if (Number.isNaN(value)) {
          ctx.addIssue({
            code: 'custom',
            path: [field],
            message: `Enter the ${what[field]} as a number, like ${field === 'heldAtC' ? '38' : '2.5'}`,
          });
          bad.add(field);
          typed[field] = null;
        } else typed[field] = value;
      }
      const litres = (v: number | null) => (v === null ? null : toLitres(v, units.volume));
      const result = sapEntryInputSchema.safeParse({
        collectedOn: values.collectedOn,
        collection: values.collection === '' ? null : values.collection,
        volumeL: litres(typed.volumeL) ?? undefined,
        sugarPct: typed.sugarPct ?? undefined,
        heldAtC: typed.heldAtC === null ? null : toCelsius(typed.heldAtC, units.temperature),
        syrupMadeL: litres(typed.syrupMadeL),
        note: values.note.trim() === '' ? null : values.note.trim(),
      });
      if (!result.success) {
        for (const issue of result.error.issues) {
          const field = String(issue.path[0] ?? '');
          if ((sapFields as readonly string[]).includes(field) && !bad.has(field))
            ctx.addIssue({ code: 'custom', path: [field], message: issue.message });
        }
        return z.NEVER;
      }
      return result.data;
    });
}
