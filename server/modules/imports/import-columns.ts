import {
  importFields,
  requiredFields,
  type ImportColumn,
  type ImportField,
  type ImportKind,
  type ImportMapping,
  type ImportRowError,
} from '../../../shared/schemas/imports';

/** Letters and digits only, lower case: `DBH (in)`, `dbh_in` and `dbhIn` read alike. */
const squash = (s: string) => s.toLowerCase().replace(/[^a-z0-9]/g, '');

/** Other names a header commonly has; none of them says a length without its unit. */
const aliases: Record<string, ImportField> = {
  tagnumber: 'tag',
  tagno: 'tag',
  latitude: 'lat',
  longitude: 'lng',
  lon: 'lng',
  long: 'lng',
  date: 'measuredOn',
  measured: 'measuredOn',
  crowndieback: 'crownDiebackPct',
  dieback: 'crownDiebackPct',
  diebackpct: 'crownDiebackPct',
  azimuth: 'azimuthDeg',
  notes: 'note',
};

export interface ResolvedColumns {
  columns: ImportColumn[];
  /** Field → index of the column holding it. */
  index: Map<ImportField, number>;
  errors: ImportRowError[];
}

/**
 * Which field each column fills: what the mapping says, else what its header names. A length is
 * only read when its unit is in the header (`dbhCm`, `DBH (in)`) or in the mapping's field.
 */
export function resolveColumns(
  kind: ImportKind,
  header: readonly string[],
  mapping: ImportMapping,
): ResolvedColumns {
  const fields = importFields[kind] as readonly ImportField[];
  const byName = new Map<string, ImportField>(fields.map((f) => [squash(f), f]));
  const errors: ImportRowError[] = [];
  const index = new Map<ImportField, number>();
  const columns = header.map((h, i): ImportColumn => {
    const mapped = Object.hasOwn(mapping.columns, h) ? mapping.columns[h] : undefined;
    let field: ImportField | null;
    if (mapped !== undefined) {
      field = mapped as ImportField | null;
      if (field !== null && !fields.includes(field)) {
        errors.push({
          row: 1,
          column: h,
          message: `A ${kind} file has no field "${field}": use one of ${fields.join(', ')}`,
        });
        field = null;
      }
    } else {
      const s = squash(h);
      field = byName.get(s) ?? (fields.includes(aliases[s]) ? aliases[s] : null);
    }
    if (field !== null) {
      if (index.has(field)) {
        errors.push({
          row: 1,
          column: h,
          message: `Both "${header[index.get(field)!]}" and "${h}" fill ${field}: leave one out in the mapping`,
        });
        field = null;
      } else index.set(field, i);
    }
    return { header: h, field };
  });
  for (const name of Object.keys(mapping.columns))
    if (!header.includes(name))
      errors.push({ row: 1, column: name, message: `The file has no column "${name}"` });
  for (const oneOf of requiredFields[kind]) {
    // Species may be stated once for every row that gives none.
    if (oneOf[0] === 'species' && mapping.defaults.species) continue;
    const present = oneOf.filter((f) => index.has(f));
    if (present.length === 0)
      errors.push({
        row: 1,
        column: oneOf[0],
        message:
          oneOf[0] === 'species'
            ? 'No column holds species: map one, or state the species of these trees'
            : oneOf.length === 1
              ? `No column holds ${oneOf[0]}: name one so, or map it`
              : `No column holds ${oneOf.join(', ')} (say the unit: ${oneOf.join(' or ')})`,
      });
    else if (present.length > 1)
      errors.push({
        row: 1,
        column: header[index.get(present[1])!],
        message: `Both "${header[index.get(present[0])!]}" and "${header[index.get(present[1])!]}" give the same figure: leave one out in the mapping`,
      });
  }
  return { columns, index, errors };
}
