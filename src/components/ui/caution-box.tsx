import type { ReactNode } from 'react';

/** Safety words where work is advised: quiet, always visible, never a modal. */
export function CautionBox({ title, children }: { title: string; children: ReactNode }) {
  return (
    <aside
      aria-label={title}
      className="rounded border-l-4 border-bark bg-frost/60 px-4 py-3 text-sm"
    >
      <p className="font-bold">{title}</p>
      <div className="mt-1 max-w-prose space-y-1">{children}</div>
    </aside>
  );
}
