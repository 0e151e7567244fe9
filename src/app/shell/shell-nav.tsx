import { useNavigate } from 'react-router';
import type { Role } from '@shared/schemas/enums';
import { paths, type SectionKey } from '@/config/paths';
import { useLogout } from '@/features/auth/api/logout';
import { can } from '@/lib/auth';
import { sections, type Section } from './sections';

/** The sections this role may use, in navigation order. */
export const sectionsFor = (role: Role | undefined): Section[] =>
  sections.filter((s) => can(role, s.permission));

/** Moves to the same section of another sugarbush (the register when coming from a tree). */
export function useSwitchSugarbush(section: SectionKey | undefined) {
  const navigate = useNavigate();
  return (id: number) => navigate(paths[section ?? 'trees'].href(id));
}

/** Ends the session and loads the sign-in page afresh, leaving nothing of this user in memory. */
export function useSignOut() {
  const logout = useLogout();
  return {
    signOut: () =>
      logout.mutate(undefined, {
        onSettled: () => window.location.assign(paths.signIn.href()),
      }),
    pending: logout.isPending,
  };
}
