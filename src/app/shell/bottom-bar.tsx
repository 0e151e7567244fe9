import { useId, useState } from 'react';
import { Link, useLocation } from 'react-router';
import type { PublicUser } from '@shared/schemas/auth';
import type { Role } from '@shared/schemas/enums';
import { cn } from '@/components/ui/cn';
import { paths, type SectionKey } from '@/config/paths';
import { SugarbushSwitcher } from '@/features/sugarbushes/components/sugarbush-switcher';
import { phonePriority } from './sections';
import { sectionsFor, useSwitchSugarbush } from './shell-nav';
import { SignOutButton } from './sign-out-button';

interface Props {
  user: PublicUser;
  sugarbushId: number | undefined;
  role: Role | undefined;
  section: SectionKey | undefined;
}

const itemClass = 'flex min-h-14 flex-1 flex-col items-center justify-center px-1 text-sm';

/** Phone navigation: four sections for the role and "More" for the rest, the stand and the user. */
export function BottomBar({ user, sugarbushId, role, section }: Props) {
  const panelId = useId();
  const location = useLocation();
  const [openAt, setOpenAt] = useState<string | null>(null);
  // The panel closes by itself once the user moves to another page.
  const open = openAt === location.key;
  const switchTo = useSwitchSugarbush(section);

  const allowed = sectionsFor(role);
  const primary = role
    ? phonePriority[role]
        .map((key) => allowed.find((s) => s.key === key))
        .filter((s) => s !== undefined)
    : [];

  return (
    <div className="md:hidden print:hidden">
      {open && (
        <div
          id={panelId}
          className="fixed inset-x-0 bottom-14 z-20 max-h-[70vh] overflow-y-auto border-t border-rule bg-paper px-4 py-4 shadow-sm"
        >
          <SugarbushSwitcher currentId={sugarbushId} onSelect={switchTo} />
          {sugarbushId !== undefined && (
            <nav aria-label="All sections" className="mt-4">
              <ul className="flex flex-col">
                {allowed.map((s) => (
                  <li key={s.key}>
                    <Link
                      to={paths[s.key].href(sugarbushId)}
                      aria-current={s.key === section ? 'page' : undefined}
                      className={cn('flex min-h-11 items-center', s.key === section && 'font-bold')}
                    >
                      {s.label}
                    </Link>
                  </li>
                ))}
              </ul>
            </nav>
          )}
          <div className="mt-4 border-t border-rule pt-3">
            <p className="text-sm font-bold">{user.name}</p>
            <SignOutButton block className="mt-2" />
          </div>
        </div>
      )}
      <nav
        aria-label="Sections"
        className="fixed inset-x-0 bottom-0 z-30 flex border-t border-rule bg-paper pb-[env(safe-area-inset-bottom)]"
      >
        {sugarbushId !== undefined &&
          primary.map((s) => (
            <Link
              key={s.key}
              to={paths[s.key].href(sugarbushId)}
              aria-current={s.key === section ? 'page' : undefined}
              className={cn(
                itemClass,
                s.key === section
                  ? 'border-t-4 border-sap font-bold'
                  : 'border-t-4 border-transparent',
              )}
            >
              {s.shortLabel}
            </Link>
          ))}
        <button
          type="button"
          aria-expanded={open}
          aria-controls={panelId}
          onClick={() => setOpenAt(open ? null : location.key)}
          className={cn(
            itemClass,
            'border-t-4',
            open ? 'border-sap font-bold' : 'border-transparent',
          )}
        >
          More
        </button>
      </nav>
    </div>
  );
}
