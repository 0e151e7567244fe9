import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import {
  speciesLabels,
  species as speciesKeys,
  treeStatusLabels,
  treeStatuses,
  type Role,
  type Species,
  type TreeStatus,
} from '@shared/schemas/enums';
import {
  importFormSchema,
  importKindLabels,
  importKinds,
  importPermission,
  type ImportField,
  type ImportForm,
  type ImportKind,
  type ImportResult,
} from '@shared/schemas/imports';
import { Button } from '@/components/ui/button';
import { Field, controlClass } from '@/components/ui/field';
import { SelectField } from '@/components/ui/select-field';
import { can } from '@/lib/auth';
import { applyServerErrors } from '@/lib/form-errors';
import { randomId } from '@/lib/random-id';
import { useImportProgress } from '../api/get-import-progress';
import { useImportFile } from '../api/import-file';
import { ColumnMapping } from './column-mapping';
import { ImportProgressBar, type UploadState } from './import-progress';
import { ImportReport } from './import-report';

const rowsLabel = (n: number) => `${n} ${n === 1 ? 'row' : 'rows'}`;

/** The kinds of file this role may import. */
export const importableKinds = (role: Role | undefined): ImportKind[] =>
  importKinds.filter((k) => can(role, importPermission[k]));

/**
 * Choose a file → it is checked (nothing written) and its first rows shown with the field each
 * column fills → correct the mapping, choosing units explicitly, and check again → import, which
 * takes every row or none.
 */
export function ImportPanel({ sugarbushId, role }: { sugarbushId: number; role: Role }) {
  const kinds = importableKinds(role);
  const form = useForm<ImportForm>({
    resolver: zodResolver(importFormSchema),
    defaultValues: {
      kind: kinds[0],
      columns: {},
      updateExisting: false,
      defaultSpecies: '',
      defaultStatus: '',
    },
  });
  const [file, setFile] = useState<File | null>(null);
  const [report, setReport] = useState<ImportResult | null>(null);
  const [done, setDone] = useState<ImportResult | null>(null);
  /** The mapping changed since the report: check again before importing. */
  const [stale, setStale] = useState(false);
  const [formError, setFormError] = useState<string | null>(null);
  const send = useImportFile(sugarbushId);
  const [upload, setUpload] = useState<UploadState | null>(null);
  const importId = send.variables?.importId ?? null;
  const progress = useImportProgress(sugarbushId, importId, send.isPending);
  const kind = form.watch('kind');
  const columns = form.watch('columns');
  const defaultSpecies = form.watch('defaultSpecies');
  const defaultStatus = form.watch('defaultStatus');

  const run = (dryRun: boolean, values: ImportForm, chosen: File | null = file) => {
    if (!chosen) {
      setFormError('Choose a file first.');
      return;
    }
    setFormError(null);
    setUpload(null);
    send.mutate(
      {
        importId: randomId(),
        onUpload: (sent, total) => setUpload({ sent, total }),
        kind: values.kind,
        file: chosen,
        mapping: {
          columns: values.columns,
          updateExisting: values.updateExisting,
          defaults:
            values.kind === 'trees'
              ? {
                  ...(values.defaultSpecies ? { species: values.defaultSpecies } : {}),
                  ...(values.defaultStatus ? { status: values.defaultStatus } : {}),
                }
              : {},
        },
        dryRun,
      },
      {
        onSuccess: (result) => {
          if (dryRun) {
            setReport(result);
            setStale(false);
            // From now on the mapping says every column, as the server read it.
            form.setValue(
              'columns',
              Object.fromEntries(result.columns.map((c) => [c.header, c.field])),
            );
          } else {
            setDone(result);
            setReport(null);
          }
        },
        onError: (error) => {
          setFormError(applyServerErrors(error, form.setError, ['kind', 'columns']));
          // Something changed since the check (another import): show what the file meets now.
          if (!dryRun) run(true, form.getValues(), chosen);
        },
      },
    );
  };

  const startOver = (next: Partial<{ file: File | null; kind: ImportKind }>) => {
    setReport(null);
    setDone(null);
    setStale(false);
    form.setValue('columns', {});
    if (next.kind) form.setValue('kind', next.kind);
    if (next.file !== undefined) setFile(next.file);
  };

  const canImport =
    report !== null &&
    !stale &&
    !send.isPending &&
    report.totalErrors === 0 &&
    report.created + report.updated > 0;

  return (
    <form
      className="flex max-w-5xl flex-col gap-6"
      onSubmit={form.handleSubmit((values) => run(true, values))}
      noValidate
    >
      <div className="flex flex-wrap items-end gap-4">
        <SelectField
          label="What the file holds"
          value={kind}
          options={kinds.map((k) => ({ value: k, label: importKindLabels[k] }))}
          onChange={(k) => startOver({ kind: k })}
          error={form.formState.errors.kind?.message}
        />
        <Field
          className="w-full min-w-0 md:w-auto"
          label="CSV or GPX file"
          hint="A spreadsheet's CSV export (comma, semicolon or tab separated), or for trees a GPS's GPX file: each waypoint's name is the tag."
        >
          {(control) => (
            <input
              {...control}
              type="file"
              accept=".csv,.txt,text/csv,.gpx,application/gpx+xml"
              className={`${controlClass} w-full min-w-0`}
              onChange={(e) => {
                const chosen = e.target.files?.[0] ?? null;
                startOver({ file: chosen });
                if (chosen) run(true, { ...form.getValues(), columns: {} }, chosen);
              }}
            />
          )}
        </Field>
      </div>

      {kind === 'trees' && (
        <div className="flex flex-wrap items-end gap-4">
          <SelectField<Species | ''>
            label="Species of a tree the file gives none"
            value={defaultSpecies}
            options={[
              { value: '', label: 'None: such a row is reported' },
              ...speciesKeys.map((k) => ({ value: k, label: speciesLabels[k] })),
            ]}
            onChange={(v) => {
              form.setValue('defaultSpecies', v);
              setStale(report !== null);
            }}
          />
          <SelectField<TreeStatus | ''>
            label="Status of a tree the file gives none"
            value={defaultStatus}
            options={[
              { value: '', label: 'Active (the register’s default)' },
              ...treeStatuses.map((k) => ({ value: k, label: treeStatusLabels[k] })),
            ]}
            onChange={(v) => {
              form.setValue('defaultStatus', v);
              setStale(report !== null);
            }}
          />
        </div>
      )}

      {kind === 'trees' && (
        <label className="flex min-h-11 items-center gap-3">
          <input
            type="checkbox"
            className="size-5"
            {...form.register('updateExisting', { onChange: () => setStale(report !== null) })}
          />
          Replace the species, status and position of a tag already in the register (otherwise such
          a row is reported and nothing is imported)
        </label>
      )}

      {formError && (
        <p role="alert" className="text-alert">
          {formError}
        </p>
      )}
      {send.isPending && (
        <ImportProgressBar
          dryRun={send.variables?.dryRun ?? true}
          upload={upload}
          server={progress.data?.importId === importId ? progress.data : undefined}
        />
      )}

      {done && (
        <div role="status" className="rounded border border-rule bg-frost/60 px-4 py-3">
          <p className="font-bold">
            Imported: {done.created} new, {done.updated} updated, {done.unchanged} already on
            record.
          </p>
        </div>
      )}

      {report && (
        <>
          <ColumnMapping
            kind={kind}
            report={report}
            columns={columns}
            onChange={(header, field: ImportField | null) => {
              form.setValue('columns', { ...columns, [header]: field });
              setStale(true);
            }}
            error={(form.formState.errors.columns as { message?: string } | undefined)?.message}
          />
          <ImportReport report={report} stale={stale} />
        </>
      )}

      <div className="flex flex-wrap gap-3">
        <Button type="submit" variant="secondary" block disabled={!file || send.isPending}>
          {report ? 'Check again' : 'Check the file'}
        </Button>
        <Button
          variant="primary"
          block
          disabled={!canImport}
          onClick={form.handleSubmit((values) => run(false, values))}
        >
          {report && report.totalErrors === 0
            ? `Import ${rowsLabel(report.created + report.updated)}`
            : 'Import'}
        </Button>
      </div>
    </form>
  );
}
