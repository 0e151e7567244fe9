import { useId } from 'react';
import { cn } from '@/components/ui/cn';
import type { Basemap } from '@shared/schemas/map';
import type { BackgroundChoice } from '../lib/background';

interface BackgroundPickerProps {
  value: BackgroundChoice;
  onChange: (choice: BackgroundChoice) => void;
  demo: boolean;
  basemaps: readonly Basemap[];
}

/** Plain grid, demo tiles or an uploaded basemap, as one radio group. */
export function BackgroundPicker({ value, onChange, demo, basemaps }: BackgroundPickerProps) {
  const name = useId();
  const options: { value: BackgroundChoice; label: string }[] = [
    { value: 'plain', label: 'Plain' },
    ...(demo ? [{ value: 'demo' as const, label: 'Demo tiles' }] : []),
    ...basemaps.map((b) => ({ value: `basemap:${b.id}` as const, label: b.name })),
  ];
  return (
    <fieldset
      role="radiogroup"
      aria-label="Background"
      className="flex flex-wrap items-center gap-2"
    >
      <legend className="mb-1 text-sm font-bold">Background</legend>
      {options.map((option) => (
        <label
          key={option.value}
          className={cn(
            'inline-flex min-h-11 cursor-pointer items-center gap-2 rounded border px-3 text-sm md:min-h-9',
            value === option.value ? 'border-ink bg-frost font-bold' : 'border-bark/40',
          )}
        >
          <input
            type="radio"
            name={name}
            value={option.value}
            checked={value === option.value}
            onChange={() => onChange(option.value)}
            className="accent-ink"
          />
          {option.label}
        </label>
      ))}
    </fieldset>
  );
}
