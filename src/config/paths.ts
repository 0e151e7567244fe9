/**
 * Every client route in one place. `path` is the router pattern; `href` builds a link.
 * Nothing else in the client writes a URL by hand.
 */

type Id = number | string;

export type SearchInit = Record<string, string | number | undefined | null>;

function withSearch(pathname: string, search?: SearchInit): string {
  if (!search) return pathname;
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(search)) {
    if (value !== undefined && value !== null && value !== '') params.set(key, String(value));
  }
  const query = params.toString();
  return query ? `${pathname}?${query}` : pathname;
}

const sugarbushSection = (segment: string) => ({
  path: `/sugarbushes/:id/${segment}`,
  href: (id: Id, search?: SearchInit) =>
    withSearch(`/sugarbushes/${encodeURIComponent(String(id))}/${segment}`, search),
});

export const paths = {
  home: { path: '/', href: () => '/' },
  signIn: {
    path: '/sign-in',
    href: (next?: string) =>
      withSearch('/sign-in', { next: next && next !== '/' ? next : undefined }),
  },
  /** `?token=` finishes a sign-up from the mailed link. */
  signUp: { path: '/sign-up', href: (token?: string) => withSearch('/sign-up', { token }) },
  forgotPassword: { path: '/forgot-password', href: () => '/forgot-password' },
  resetPassword: {
    path: '/reset-password',
    href: (token?: string) => withSearch('/reset-password', { token }),
  },
  invitation: {
    path: '/invitations/:token',
    href: (token: string) => `/invitations/${encodeURIComponent(token)}`,
  },
  /** A signed-in person with no stand yet starts one here. */
  newSugarbush: { path: '/sugarbushes/new', href: () => '/sugarbushes/new' },
  trees: sugarbushSection('trees'),
  /** CSV imports of trees, readings and tapholes. */
  imports: sugarbushSection('imports'),
  tree: {
    path: '/trees/:treeId',
    href: (treeId: Id, search?: SearchInit) =>
      withSearch(`/trees/${encodeURIComponent(String(treeId))}`, search),
  },
  map: sugarbushSection('map'),
  round: sugarbushSection('round'),
  plan: sugarbushSection('plan'),
  /** Every tree to tap, in walking order, as a sheet to print (takes the plan's filters). */
  fieldSheet: sugarbushSection('plan/field-sheet'),
  overview: sugarbushSection('overview'),
  /** The compliance report of one season as a printable page. */
  complianceReport: sugarbushSection('overview/compliance-report'),
  notes: sugarbushSection('notes'),
  season: sugarbushSection('season'),
  settings: sugarbushSection('settings'),
} as const;

/** The sections that live under one sugarbush, in the order the navigation shows them. */
export type SectionKey =
  'trees' | 'map' | 'round' | 'plan' | 'overview' | 'notes' | 'season' | 'settings';

/** A `?next=` value is only honoured when it is a path inside this app. */
export function safeNext(next: string | null | undefined): string | undefined {
  if (!next || !next.startsWith('/') || next.startsWith('//') || next.startsWith('/\\'))
    return undefined;
  if (next.startsWith(paths.signIn.path)) return undefined;
  return next;
}
