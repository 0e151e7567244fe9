import type { UseFormRegisterReturn } from 'react-hook-form';
import { collections } from '@shared/schemas/enums';
import { controlClass, Field } from '@/components/ui/field';
import { collectionLabels } from '@/lib/collection-labels';

/** How the sap is collected; with `none`, a first option that stands for "not given" (''). */
export function CollectionSelect({
  registration,
  error,
  none,
}: {
  registration: UseFormRegisterReturn;
  error?: string;
  none?: string;
}) {
  return (
    <Field label="Collection" error={error}>
      {(control) => (
        <select {...control} {...registration} className={controlClass}>
          {none !== undefined && <option value="">{none}</option>}
          {collections.map((c) => (
            <option key={c} value={c}>
              {collectionLabels[c]}
            </option>
          ))}
        </select>
      )}
    </Field>
  );
}
