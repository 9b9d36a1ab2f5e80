import { useState, type ComponentType } from 'react';
import { createBrowserRouter, redirect, RouterProvider, type LoaderFunction, type RouteObject } from 'react-router-dom';
import type { QueryClient } from '@tanstack/react-query';
import { queryClient } from '../lib/query-client';
import { LoadingState } from '../components/ui/loading-state';
import { RootLayout } from './routes/root';
import { RouteError } from './routes/route-error';
import { NotFoundRoute } from './routes/not-found';
import { AppShell } from './routes/app-shell';
import { guestLoader, requireSessionLoader } from './routes/session-loaders';

/**
 * A screen whose code loads on first visit. Keeps the first download small: a visitor
 * on /signin does not wait for the tables of Settings, and vice versa.
 */
function screen<M>(load: () => Promise<M>, pick: (module: M) => { Component: ComponentType; loader?: LoaderFunction }) {
  return { lazy: async () => pick(await load()) };
}

/**
 * The route table. Loaders warm the query cache (`ensureQueryData`), screens read the
 * same query options with `useSuspenseQuery`. Everything under the app shell needs a
 * session; its loader sends anyone without one to /signin.
 */
export function createRoutes(client: QueryClient): RouteObject[] {
  // Shown while a route's loader runs on the first page load, under the root layout
  // (so the reconnecting notice can show above it).
  const opening = (
    <div className="flex min-h-[60vh] items-center justify-center">
      <LoadingState label="Opening Farthing…" />
    </div>
  );

  return [
    {
      element: <RootLayout />,
      errorElement: <RouteError fullPage />,
      hydrateFallbackElement: opening,
      children: [
        {
          path: '/signin',
          loader: guestLoader(client),
          hydrateFallbackElement: opening,
          ...screen(() => import('./routes/auth/sign-in'), (m) => ({ Component: m.SignInRoute })),
        },
        {
          path: '/signup',
          loader: guestLoader(client),
          hydrateFallbackElement: opening,
          ...screen(() => import('./routes/auth/sign-up'), (m) => ({ Component: m.SignUpRoute })),
        },
        {
          path: '/invite/:token',
          hydrateFallbackElement: opening,
          ...screen(
            () => import('./routes/auth/accept-invite'),
            (m) => ({ Component: m.AcceptInviteRoute, loader: m.acceptInviteLoader(client) }),
          ),
        },
        {
          path: '/reset-password',
          hydrateFallbackElement: opening,
          ...screen(() => import('./routes/auth/reset-password-request'), (m) => ({ Component: m.ResetPasswordRequestRoute })),
        },
        {
          path: '/reset-password/:token',
          hydrateFallbackElement: opening,
          ...screen(() => import('./routes/auth/reset-password-confirm'), (m) => ({ Component: m.ResetPasswordConfirmRoute })),
        },
        {
          loader: requireSessionLoader(client),
          element: <AppShell />,
          hydrateFallbackElement: opening,
          children: [
            {
              // Errors of one screen show inside the frame, so navigation stays at hand.
              errorElement: <RouteError />,
              children: [
                { index: true, loader: () => redirect('/boms') },
                { path: 'boms', ...screen(() => import('./routes/boms/boms-list'), (m) => ({ Component: m.BomsListRoute })) },
                { path: 'parts', ...screen(() => import('./routes/parts/parts-list'), (m) => ({ Component: m.PartsListRoute })) },
                {
                  path: 'suppliers',
                  ...screen(() => import('./routes/suppliers/suppliers-list'), (m) => ({ Component: m.SuppliersListRoute })),
                },
                {
                  path: 'quote-board',
                  ...screen(() => import('./routes/quote-board/quote-board'), (m) => ({ Component: m.QuoteBoardRoute })),
                },
                { path: 'rfqs', ...screen(() => import('./routes/rfqs/rfqs-list'), (m) => ({ Component: m.RfqsListRoute })) },
                { path: 'settings', loader: () => redirect('/settings/members') },
                {
                  path: 'settings/landed-cost-profiles',
                  ...screen(
                    () => import('./routes/settings/landed-cost-profiles'),
                    (m) => ({ Component: m.LandedCostProfilesRoute }),
                  ),
                },
                {
                  path: 'settings/fx-rates',
                  ...screen(() => import('./routes/settings/fx-rates'), (m) => ({ Component: m.FxRatesRoute })),
                },
                {
                  path: 'settings/stress-policies',
                  ...screen(() => import('./routes/settings/stress-policies'), (m) => ({ Component: m.StressPoliciesRoute })),
                },
                {
                  path: 'settings/members',
                  ...screen(
                    () => import('./routes/settings/members'),
                    (m) => ({ Component: m.MembersRoute, loader: m.membersLoader(client) }),
                  ),
                },
                {
                  path: 'settings/tokens',
                  ...screen(
                    () => import('./routes/settings/tokens'),
                    (m) => ({ Component: m.TokensRoute, loader: m.tokensLoader(client) }),
                  ),
                },
                {
                  path: 'settings/billing',
                  ...screen(() => import('./routes/settings/billing'), (m) => ({ Component: m.BillingRoute })),
                },
                {
                  path: 'api-reference',
                  ...screen(
                    () => import('./routes/api-reference/api-reference'),
                    (m) => ({ Component: m.ApiReferenceRoute, loader: m.apiReferenceLoader(client) }),
                  ),
                },
                { path: '*', element: <NotFoundRoute /> },
              ],
            },
          ],
        },
      ],
    },
  ];
}

export function AppRouter() {
  // One router for the life of the page (StrictMode renders twice; state keeps one).
  const [router] = useState(() => createBrowserRouter(createRoutes(queryClient)));
  return <RouterProvider router={router} />;
}
