import { useId, useState } from 'react';

/** Where a rule comes from, one click away. */
export function WhyDisclosure({ source, label = 'Why?' }: { source: string; label?: string }) {
  const [open, setOpen] = useState(false);
  const id = useId();
  return (
    <div className="text-sm">
      <button
        type="button"
        aria-expanded={open}
        aria-controls={id}
        onClick={() => setOpen((o) => !o)}
        className="min-h-11 underline underline-offset-4 hover:text-bark md:min-h-0 print:hidden"
      >
        {label}
      </button>
      <p id={id} hidden={!open} className="mt-1 max-w-prose text-bark">
        Source: {source}
      </p>
    </div>
  );
}
