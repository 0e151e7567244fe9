import { cn } from '@/components/ui/cn';
import { Field, controlClass } from '@/components/ui/field';
import type { UnitSystem } from '@/lib/units';
import {
  bitLabel,
  depthText,
  type TapholeDefaults,
  type TapholeErrors,
  type TapholeFormValues,
} from './taphole-form-values';

type DrillValues = Pick<TapholeFormValues, 'depth' | 'bitCm'>;

/** Depth drilled (bark included) and the bit, both starting at the advised drill. */
export function DrillInputs({
  values,
  onChange,
  defaults,
  bitOptions,
  system,
  errors,
}: {
  values: DrillValues;
  onChange: (next: Partial<DrillValues>) => void;
  defaults: TapholeDefaults;
  bitOptions: readonly number[];
  system: UnitSystem;
  errors: TapholeErrors;
}) {
  const imperial = system === 'imperial';
  return (
    <div className="flex flex-wrap items-start gap-3">
      <Field
        label="Depth"
        error={errors.depthCm}
        hint={imperial ? 'Inches, bark included.' : 'Centimetres, bark included.'}
        className="min-w-36 flex-1"
      >
        {(control) => (
          <span className="flex items-center gap-2">
            <input
              {...control}
              type="text"
              inputMode="decimal"
              autoComplete="off"
              value={values.depth ?? depthText(defaults.depthCm, system)}
              onChange={(e) => onChange({ depth: e.target.value })}
              className={cn(controlClass, 'w-24 tabular-nums')}
            />
            <span aria-hidden="true">{imperial ? 'in' : 'cm'}</span>
          </span>
        )}
      </Field>
      <Field label="Bit" error={errors.bitCm} className="min-w-36 flex-1">
        {(control) => (
          <select
            {...control}
            value={values.bitCm ?? String(defaults.bitCm)}
            onChange={(e) => onChange({ bitCm: e.target.value })}
            className={controlClass}
          >
            {bitOptions.map((cm) => (
              <option key={cm} value={String(cm)}>
                {bitLabel(cm, system)}
              </option>
            ))}
          </select>
        )}
      </Field>
    </div>
  );
}
