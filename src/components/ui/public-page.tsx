import type { ReactNode } from 'react';
import { cn } from './cn';

/**
 * A page for someone who may not be signed in (sign-in, sign-up, a mailed link): the name, one
 * heading, an optional line under it, and a single narrow column.
 */
export function PublicPage({
  title,
  lead,
  wide = false,
  children,
}: {
  title: string;
  lead?: ReactNode;
  wide?: boolean;
  children?: ReactNode;
}) {
  return (
    <main className="flex min-h-screen items-start justify-center px-4 pb-12 pt-16 md:items-center md:pt-0">
      <title>{`${title} · Clearwood`}</title>
      <div className={cn('w-full', wide ? 'max-w-lg' : 'max-w-sm')}>
        <p className="text-lg font-bold tracking-wide">Clearwood</p>
        <h1 className="mt-6 text-xl font-bold">{title}</h1>
        {lead && <div className="mt-1 max-w-prose text-bark">{lead}</div>}
        <div className="mt-6 flex flex-col gap-4">{children}</div>
      </div>
    </main>
  );
}
