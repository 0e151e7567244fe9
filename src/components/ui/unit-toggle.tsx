import { useUnitSystem, type UnitSystem } from '@/lib/units';
import { cn } from './cn';

const options: { system: UnitSystem; label: string }[] = [
  { system: 'imperial', label: 'in' },
  { system: 'metric', label: 'cm' },
];

/**
 * Switches every length on screen between inches and centimetres; remembered on this device.
 * `labels` names the choice where a page shows other quantities (°F and gallons, °C and litres).
 */
export function UnitToggle({ labels }: { labels?: Record<UnitSystem, string> } = {}) {
  const { system, setSystem } = useUnitSystem();
  return (
    <div role="group" aria-label="Units" className="inline-flex rounded border border-bark/40">
      {options.map((option) => (
        <button
          key={option.system}
          type="button"
          aria-pressed={system === option.system}
          onClick={() => setSystem(option.system)}
          className={cn(
            'min-h-11 min-w-11 px-3 text-sm md:min-h-8',
            system === option.system ? 'bg-ink text-paper' : 'text-ink hover:bg-frost',
          )}
        >
          {labels?.[option.system] ?? option.label}
        </button>
      ))}
    </div>
  );
}
