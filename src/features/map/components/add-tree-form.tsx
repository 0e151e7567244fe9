import { useState, type FormEvent } from 'react';
import type { Species, TreeStatus } from '@shared/schemas/enums';
import type { Tree } from '@shared/schemas/tree';
import { Button } from '@/components/ui/button';
import { Field, controlClass } from '@/components/ui/field';
import { SelectField } from '@/components/ui/select-field';
import { isApiError } from '@/lib/api-client';
import { speciesOptions, statusOptions } from '@/lib/tree-options';
import { formatNumber } from '@/lib/units';
import { mapTreeInputSchema, useCreateTree } from '../api/create-tree';
import type { LatLng } from './move-marker';

/** Tag, species and status for a tree placed on the map at a known spot. */
export function AddTreeForm({
  sugarbushId,
  at,
  onAdded,
  onCancel,
}: {
  sugarbushId: number;
  at: LatLng;
  onAdded: (tree: Tree) => void;
  onCancel: () => void;
}) {
  const create = useCreateTree(sugarbushId);
  const [tag, setTag] = useState('');
  const [species, setSpecies] = useState<Species>('sugar-maple');
  const [status, setStatus] = useState<TreeStatus>('active');
  const [errors, setErrors] = useState<Record<string, string>>({});

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const parsed = mapTreeInputSchema.safeParse({ tag, species, status, ...at });
    if (!parsed.success) {
      setErrors(Object.fromEntries(parsed.error.issues.map((i) => [String(i.path[0]), i.message])));
      return;
    }
    setErrors({});
    create.mutate(parsed.data, {
      onSuccess: onAdded,
      onError: (error) =>
        setErrors(
          isApiError(error)
            ? (error.fields ?? { form: error.message })
            : { form: 'The tree could not be added. Try again.' },
        ),
    });
  };

  return (
    <form
      onSubmit={submit}
      aria-label="Add a tree"
      className="flex flex-col gap-3 rounded border border-rule bg-paper p-4"
      noValidate
    >
      <p className="text-sm text-bark tabular-nums">
        At {formatNumber(at.lat, 6)}, {formatNumber(at.lng, 6)}
      </p>
      <Field label="Tag" error={errors.tag}>
        {(control) => (
          <input
            {...control}
            value={tag}
            onChange={(e) => setTag(e.target.value)}
            autoComplete="off"
            autoFocus
            className={controlClass}
          />
        )}
      </Field>
      <SelectField
        label="Species"
        error={errors.species}
        value={species}
        options={speciesOptions}
        onChange={setSpecies}
      />
      <SelectField
        label="Status"
        error={errors.status}
        value={status}
        options={statusOptions}
        onChange={setStatus}
      />
      {errors.form && (
        <p role="alert" className="text-sm text-alert">
          {errors.form}
        </p>
      )}
      <div className="flex gap-2">
        <Button type="submit" variant="primary" disabled={create.isPending} block>
          {create.isPending ? 'Adding…' : 'Add tree'}
        </Button>
        <Button onClick={onCancel} disabled={create.isPending}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
