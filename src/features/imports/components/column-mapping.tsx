import {
  importFieldLabels,
  importFields,
  type ImportField,
  type ImportKind,
  type ImportResult,
} from '@shared/schemas/imports';
import { controlClass } from '@/components/ui/field';

const LEAVE_OUT = '';

/**
 * The file's first rows under its own headers, each header with the field it fills. A length
 * is only read in the unit chosen here (or named by its header): nothing is guessed.
 */
export function ColumnMapping({
  kind,
  report,
  columns,
  onChange,
  error,
}: {
  kind: ImportKind;
  report: ImportResult;
  columns: Record<string, string | null>;
  onChange: (header: string, field: ImportField | null) => void;
  error?: string;
}) {
  const fields = importFields[kind] as readonly ImportField[];
  return (
    <section aria-labelledby="import-columns" className="flex flex-col gap-2">
      <h2 id="import-columns" className="text-lg font-bold">
        Columns and their first rows
      </h2>
      <p className="max-w-prose text-sm text-bark">
        Choose what each column holds. Lengths are read in the unit you choose: a value that says
        another unit (“30 cm” in an inch column) is reported, never converted.
      </p>
      {error && (
        <p role="alert" className="text-alert">
          {error}
        </p>
      )}
      <div className="overflow-x-auto">
        <table className="min-w-full border-collapse text-sm">
          <caption className="sr-only">
            The file's columns, what each fills, and its first rows
          </caption>
          <thead>
            <tr>
              {report.columns.map((c, i) => (
                <th
                  key={`${i}-${c.header}`}
                  scope="col"
                  className="border-b border-rule p-2 text-left align-bottom"
                >
                  <span className="block font-bold">{c.header || `(column ${i + 1})`}</span>
                  <label className="sr-only" htmlFor={`import-field-${i}`}>
                    What “{c.header}” holds
                  </label>
                  <select
                    id={`import-field-${i}`}
                    className={controlClass}
                    value={columns[c.header] ?? LEAVE_OUT}
                    onChange={(e) =>
                      onChange(c.header, (e.target.value || null) as ImportField | null)
                    }
                  >
                    <option value={LEAVE_OUT}>Leave out</option>
                    {fields.map((f) => (
                      <option key={f} value={f}>
                        {importFieldLabels[f]}
                      </option>
                    ))}
                  </select>
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {report.preview.map((cells, r) => (
              <tr key={r} className="border-b border-rule/60">
                {report.columns.map((_, i) => (
                  <td key={i} className="whitespace-pre-wrap p-2 align-top">
                    {cells[i] ?? ''}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </section>
  );
}
