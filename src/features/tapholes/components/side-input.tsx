import { cn } from '@/components/ui/cn';
import { Field, controlClass } from '@/components/ui/field';
import { compassKeys, nearestPoint, pointDeg, type CompassPoint } from '@/lib/compass';
import type { TapholeFormValues } from './taphole-form-values';

type SideValues = Pick<TapholeFormValues, 'side' | 'exactDeg'>;

/**
 * The side drilled: one of eight compass points, or exact degrees for a finer record. Typing
 * degrees moves the compass point to the nearest; picking a point clears the degrees.
 */
export function SideInput({
  values,
  onChange,
  error,
}: {
  values: SideValues;
  onChange: (next: Partial<SideValues>) => void;
  error?: string;
}) {
  const exactTyped = values.exactDeg.trim() !== '';
  return (
    <div className="flex flex-wrap items-start gap-3">
      <Field label="Side" error={exactTyped ? undefined : error} className="min-w-36 flex-1">
        {(control) => (
          <select
            {...control}
            value={values.side}
            onChange={(e) => onChange({ side: e.target.value as CompassPoint, exactDeg: '' })}
            className={controlClass}
          >
            <option value="" disabled>
              Choose
            </option>
            {compassKeys.map((p) => (
              <option key={p} value={p}>
                {p} ({pointDeg(p)}°)
              </option>
            ))}
          </select>
        )}
      </Field>
      <Field
        label="Exact degrees"
        hint="Optional. 0° is north, 90° east."
        error={exactTyped ? error : undefined}
        className="min-w-36 flex-1"
      >
        {(control) => (
          <input
            {...control}
            type="text"
            inputMode="decimal"
            autoComplete="off"
            value={values.exactDeg}
            onChange={(e) => {
              const typed = e.target.value;
              const deg = Number(typed.replace(',', '.'));
              const onTrunk = typed.trim() !== '' && deg >= 0 && deg < 360;
              onChange({ exactDeg: typed, ...(onTrunk && { side: nearestPoint(deg) }) });
            }}
            className={cn(controlClass, 'tabular-nums')}
          />
        )}
      </Field>
    </div>
  );
}
