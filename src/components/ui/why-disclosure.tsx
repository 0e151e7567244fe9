import { useId, useState } from 'react';

/** Where a rule comes from, one click away; `notes` add where its other figures come from. */
export function WhyDisclosure({
  source,
  label = 'Why?',
  name,
  notes,
}: {
  source: string;
  label?: string;
  /** The button's accessible name where several sit on one page ("Why? Traditional"). */
  name?: string;
  notes?: readonly string[];
}) {
  const [open, setOpen] = useState(false);
  const id = useId();
  return (
    <div className="text-sm">
      <button
        type="button"
        aria-expanded={open}
        aria-controls={id}
        aria-label={name}
        onClick={() => setOpen((o) => !o)}
        className="min-h-11 underline underline-offset-4 hover:text-bark md:min-h-0 print:hidden"
      >
        {label}
      </button>
      <div id={id} hidden={!open} className="mt-1 max-w-prose text-bark">
        <p>Source: {source}</p>
        {notes && notes.length > 0 && (
          <ul className="mt-1 list-disc space-y-0.5 pl-5">
            {notes.map((note) => (
              <li key={note}>{note}</li>
            ))}
          </ul>
        )}
      </div>
    </div>
  );
}
