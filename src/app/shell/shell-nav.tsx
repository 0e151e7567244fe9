import { useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { useNavigate } from 'react-router';
import type { Role } from '@shared/schemas/enums';
import { paths, type SectionKey } from '@/config/paths';
import { useLogout } from '@/features/auth/api/logout';
import { can } from '@/lib/auth';
import { useRefusedEntries, useWaitingFieldEntries } from '@/lib/field-entries';
import { clearDeviceCache } from '@/lib/query-persistence';
import { sections, type Section } from './sections';

/** The sections this role may use, in navigation order. */
export const sectionsFor = (role: Role | undefined): Section[] =>
  sections.filter((s) => can(role, s.permission));

/** Moves to the same section of another sugarbush (the register when coming from a tree). */
export function useSwitchSugarbush(section: SectionKey | undefined) {
  const navigate = useNavigate();
  return (id: number) => navigate(paths[section ?? 'trees'].href(id));
}

/**
 * Ends the session, forgets everything this device kept for the user, and loads the sign-in page
 * afresh. With entries not on the server yet (waiting or refused) it asks first, saying how many
 * would be lost.
 */
export function useSignOut() {
  const logout = useLogout();
  const queryClient = useQueryClient();
  const unsent = useWaitingFieldEntries() + useRefusedEntries().length;
  const [asking, setAsking] = useState(false);
  const run = () =>
    logout.mutate(undefined, {
      onSettled: async () => {
        try {
          await clearDeviceCache(queryClient);
        } finally {
          window.location.assign(paths.signIn.href());
        }
      },
    });
  return {
    signOut: () => (unsent > 0 ? setAsking(true) : run()),
    confirm: run,
    cancel: () => setAsking(false),
    asking: asking && unsent > 0,
    unsent,
    pending: logout.isPending,
  };
}
