import { Link } from 'react-router';
import type { PublicUser } from '@shared/schemas/auth';
import type { Role } from '@shared/schemas/enums';
import { cn } from '@/components/ui/cn';
import { paths, type SectionKey } from '@/config/paths';
import { SugarbushSwitcher } from '@/features/sugarbushes/components/sugarbush-switcher';
import { sectionsFor, useSwitchSugarbush } from './shell-nav';
import { SignOutButton } from './sign-out-button';

interface Props {
  user: PublicUser;
  sugarbushId: number | undefined;
  role: Role | undefined;
  section: SectionKey | undefined;
}

/** Desktop navigation: the name, the stand, the role's sections, and the user. */
export function SideRail({ user, sugarbushId, role, section }: Props) {
  const switchTo = useSwitchSugarbush(section);
  return (
    <div className="sticky top-0 hidden h-screen w-60 shrink-0 flex-col border-r border-rule px-4 py-6 md:flex print:hidden">
      <Link to={paths.home.href()} className="text-lg font-bold tracking-wide">
        Clearwood
      </Link>
      <div className="mt-6">
        <SugarbushSwitcher currentId={sugarbushId} onSelect={switchTo} />
      </div>
      {sugarbushId !== undefined && (
        <nav aria-label="Sections" className="mt-6 flex-1">
          <ul className="flex flex-col gap-1">
            {sectionsFor(role).map((s) => {
              const current = s.key === section;
              return (
                <li key={s.key}>
                  <Link
                    to={paths[s.key].href(sugarbushId)}
                    aria-current={current ? 'page' : undefined}
                    className={cn(
                      'block rounded border-l-4 px-3 py-1.5',
                      current
                        ? 'border-sap bg-frost/70 font-bold'
                        : 'border-transparent hover:bg-frost/50',
                    )}
                  >
                    {s.label}
                  </Link>
                </li>
              );
            })}
          </ul>
        </nav>
      )}
      <div className="mt-6 border-t border-rule pt-4">
        <p className="text-sm font-bold">{user.name}</p>
        <p className="truncate text-sm text-bark">{user.email}</p>
        <SignOutButton variant="quiet" className="mt-1 px-0" />
      </div>
    </div>
  );
}
