import { useQueryClient } from '@tanstack/react-query';
import { useEffect } from 'react';
import { Navigate, Outlet, useLocation } from 'react-router';
import { paths } from '@/config/paths';
import { useMe, useRole } from '@/lib/auth';
import { claimDeviceCache } from '@/lib/query-persistence';
import { BottomBar } from './bottom-bar';
import { FieldEntryStatus } from './field-entry-status';
import { useCurrentSection, useCurrentSugarbushId } from './current-sugarbush';
import { SideRail } from './side-rail';

/** Every signed-in page: the rail (desktop) or bottom bar (phone) around one column of content. */
export function AppShell() {
  const { data: me } = useMe();
  const location = useLocation();
  const sugarbushId = useCurrentSugarbushId();
  const role = useRole(sugarbushId);
  const section = useCurrentSection();
  const queryClient = useQueryClient();
  const userId = me?.user.id;
  // What this device keeps belongs to whoever is signed in: another user's is forgotten first.
  useEffect(() => {
    if (userId !== undefined) void claimDeviceCache(queryClient, userId);
  }, [queryClient, userId]);

  // The session ended while the app was open: sign in again, then come back here.
  if (!me) return <Navigate to={paths.signIn.href(location.pathname + location.search)} replace />;

  const nav = { user: me.user, sugarbushId, role, section };
  return (
    <div className="min-h-screen md:flex">
      <a
        href="#main"
        className="sr-only z-40 rounded bg-ink px-3 py-2 text-paper focus:not-sr-only focus:fixed focus:left-2 focus:top-2"
      >
        Skip to content
      </a>
      <SideRail {...nav} />
      <main
        id="main"
        className="mx-auto w-full min-w-0 max-w-6xl flex-1 px-4 pb-28 pt-6 md:px-8 md:pb-12"
      >
        <FieldEntryStatus />
        <Outlet />
      </main>
      <BottomBar {...nav} />
    </div>
  );
}
