import type { QueryClient } from '@tanstack/react-query';
import { createBrowserRouter, type RouteObject } from 'react-router';
import { paths, type SectionKey } from '@/config/paths';
import { AppLoading } from './app-loading';
import { requireMe } from './loaders';
import { RouteError } from './route-error';
import { AppShell } from './shell/app-shell';
import type { SectionHandle } from './shell/sections';

const handle = (section: SectionKey): SectionHandle => ({ section });

/** Every page is its own lazily loaded module; loaders that need the cache get it here. */
export function createRoutes(queryClient: QueryClient): RouteObject[] {
  // Pages for someone who may not be signed in: outside the shell, like sign-in.
  const publicPages: { path: string; load: NonNullable<RouteObject['lazy']> }[] = [
    {
      path: paths.signUp.path,
      load: async () => {
        const { SignUpRoute, signUpLoader } = await import('./routes/sign-up');
        return { Component: SignUpRoute, loader: signUpLoader(queryClient) };
      },
    },
    {
      path: paths.forgotPassword.path,
      load: async () => ({
        Component: (await import('./routes/forgot-password')).ForgotPasswordRoute,
      }),
    },
    {
      path: paths.resetPassword.path,
      load: async () => ({
        Component: (await import('./routes/reset-password')).ResetPasswordRoute,
      }),
    },
    {
      path: paths.invitation.path,
      load: async () => ({ Component: (await import('./routes/invitation')).InvitationRoute }),
    },
  ];

  return [
    {
      path: paths.signIn.path,
      hydrateFallbackElement: <AppLoading />,
      errorElement: <RouteError />,
      lazy: async () => {
        const { SignInRoute, signInLoader } = await import('./routes/sign-in');
        return { Component: SignInRoute, loader: signInLoader(queryClient) };
      },
    },
    ...publicPages.map(({ path, load }) => ({
      path,
      hydrateFallbackElement: <AppLoading />,
      errorElement: <RouteError />,
      lazy: load,
    })),
    {
      id: 'app',
      Component: AppShell,
      loader: ({ request }) => requireMe(queryClient, request),
      hydrateFallbackElement: <AppLoading />,
      errorElement: <RouteError />,
      children: [
        {
          errorElement: <RouteError />,
          children: [
            {
              index: true,
              lazy: async () => {
                const { HomeRoute, homeLoader } = await import('./routes/home');
                return { Component: HomeRoute, loader: homeLoader(queryClient) };
              },
            },
            {
              path: paths.newSugarbush.path,
              lazy: async () => ({
                Component: (await import('./routes/new-sugarbush')).NewSugarbushRoute,
              }),
            },
            {
              path: paths.trees.path,
              handle: handle('trees'),
              lazy: async () => ({
                Component: (await import('./routes/tree-register')).TreeRegisterRoute,
              }),
            },
            {
              path: paths.imports.path,
              handle: handle('trees'),
              lazy: async () => ({ Component: (await import('./routes/imports')).ImportsRoute }),
            },
            {
              path: paths.tree.path,
              handle: handle('trees'),
              lazy: async () => ({ Component: (await import('./routes/tree')).TreeRoute }),
            },
            {
              path: paths.round.path,
              handle: handle('round'),
              lazy: async () => ({
                Component: (await import('./routes/measuring-round')).MeasuringRoundRoute,
              }),
            },
            {
              path: paths.plan.path,
              handle: handle('plan'),
              lazy: async () => ({
                Component: (await import('./routes/season-plan')).SeasonPlanRoute,
              }),
            },
            {
              path: paths.fieldSheet.path,
              handle: handle('plan'),
              lazy: async () => ({
                Component: (await import('./routes/field-sheet')).FieldSheetRoute,
              }),
            },
            {
              path: paths.map.path,
              handle: handle('map'),
              lazy: async () => ({
                Component: (await import('./routes/woods-map')).WoodsMapRoute,
              }),
            },
            {
              path: paths.notes.path,
              handle: handle('notes'),
              lazy: async () => ({ Component: (await import('./routes/notes')).NotesRoute }),
            },
            {
              path: paths.overview.path,
              handle: handle('overview'),
              lazy: async () => ({
                Component: (await import('./routes/overview')).OverviewRoute,
              }),
            },
            {
              path: paths.complianceReport.path,
              handle: handle('overview'),
              lazy: async () => ({
                Component: (await import('./routes/compliance-report')).ComplianceReportRoute,
              }),
            },
            {
              path: paths.season.path,
              handle: handle('season'),
              lazy: async () => ({
                Component: (await import('./routes/season-log')).SeasonLogRoute,
              }),
            },
            {
              path: paths.settings.path,
              handle: handle('settings'),
              lazy: async () => ({
                Component: (await import('./routes/settings')).SettingsRoute,
              }),
            },
            {
              path: '*',
              lazy: async () => ({ Component: (await import('./routes/not-found')).NotFoundRoute }),
            },
          ],
        },
      ],
    },
  ];
}

export const createAppRouter = (queryClient: QueryClient) =>
  createBrowserRouter(createRoutes(queryClient));
