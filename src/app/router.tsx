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
          // A supplier's answer page: public, outside the signed-in frame; the token is the key.
          path: '/rfq/:token',
          hydrateFallbackElement: opening,
          ...screen(() => import('./routes/rfq-reply/rfq-reply'), (m) => ({ Component: m.RfqReplyRoute, loader: m.rfqReplyLoader(client) })),
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
                {
                  path: 'boms',
                  ...screen(() => import('./routes/boms/boms-list'), (m) => ({ Component: m.BomsListRoute, loader: m.bomsListLoader(client) })),
                },
                {
                  // The BOM page: heading, tabs (each an address) and the running total.
                  path: 'boms/:bomId',
                  ...screen(() => import('./routes/boms/bom-page'), (m) => ({ Component: m.BomPageRoute, loader: m.bomPageLoader(client) })),
                  children: [
                    // The bare address opens the Lines tab (element null: nothing shows before the redirect).
                    { index: true, element: null, loader: ({ params }) => redirect(`/boms/${params.bomId}/lines`) },
                    {
                      path: 'lines',
                      ...screen(() => import('./routes/boms/bom-lines'), (m) => ({ Component: m.BomLinesRoute, loader: m.bomLinesLoader(client) })),
                    },
                    { path: 'cost-roll', ...screen(() => import('./routes/boms/bom-cost-roll'), (m) => ({ Component: m.BomCostRollRoute })) },
                    {
                      path: 'stress-check',
                      ...screen(() => import('./routes/boms/bom-stress-check'), (m) => ({ Component: m.BomStressCheckRoute, loader: m.bomStressCheckLoader(client) })),
                    },
                    { path: 'volume-curve', ...screen(() => import('./routes/boms/bom-volume-curve'), (m) => ({ Component: m.BomVolumeCurveRoute })) },
                    {
                      path: 'shelf-price-ladder',
                      ...screen(() => import('./routes/boms/bom-shelf-ladder'), (m) => ({ Component: m.BomShelfLadderRoute })),
                    },
                    { path: 'revisions', ...screen(() => import('./routes/boms/bom-revisions'), (m) => ({ Component: m.BomRevisionsRoute })) },
                  ],
                },
                {
                  path: 'parts',
                  ...screen(
                    () => import('./routes/parts/parts-list'),
                    (m) => ({ Component: m.PartsListRoute, loader: m.partsListLoader(client) }),
                  ),
                },
                {
                  path: 'parts/:id',
                  ...screen(
                    () => import('./routes/parts/part-detail'),
                    (m) => ({ Component: m.PartDetailRoute, loader: m.partDetailLoader(client) }),
                  ),
                },
                {
                  path: 'parts/:id/offers',
                  lazy: async () => ({ loader: (await import('./routes/parts/part-offers-redirect')).partOffersLoader }),
                },
                { path: 'tools', ...screen(() => import('./routes/tools/circuit-helpers'), (m) => ({ Component: m.CircuitHelpersRoute })) },
                {
                  path: 'suppliers',
                  ...screen(
                    () => import('./routes/suppliers/suppliers-list'),
                    (m) => ({ Component: m.SuppliersListRoute, loader: m.suppliersListLoader(client) }),
                  ),
                },
                {
                  path: 'suppliers/:id',
                  ...screen(
                    () => import('./routes/suppliers/supplier-detail'),
                    (m) => ({ Component: m.SupplierDetailRoute, loader: m.supplierDetailLoader(client) }),
                  ),
                },
                {
                  path: 'quote-board',
                  ...screen(
                    () => import('./routes/quote-board/quote-board'),
                    (m) => ({ Component: m.QuoteBoardRoute, loader: m.quoteBoardLoader(client) }),
                  ),
                },
                {
                  path: 'rfqs',
                  ...screen(() => import('./routes/rfqs/rfqs-list'), (m) => ({ Component: m.RfqsListRoute, loader: m.rfqsListLoader(client) })),
                },
                {
                  path: 'rfqs/new',
                  ...screen(() => import('./routes/rfqs/rfq-new'), (m) => ({ Component: m.RfqNewRoute, loader: m.rfqNewLoader(client) })),
                },
                {
                  path: 'rfqs/:id',
                  ...screen(() => import('./routes/rfqs/rfq-detail'), (m) => ({ Component: m.RfqDetailRoute, loader: m.rfqDetailLoader(client) })),
                },
                { path: 'settings', loader: () => redirect('/settings/members') },
                {
                  path: 'settings/landed-cost-profiles',
                  ...screen(
                    () => import('./routes/settings/landed-cost-profiles'),
                    (m) => ({ Component: m.LandedCostProfilesRoute, loader: m.landedCostProfilesLoader(client) }),
                  ),
                },
                {
                  path: 'settings/fx-rates',
                  ...screen(
                    () => import('./routes/settings/fx-rates'),
                    (m) => ({ Component: m.FxRatesRoute, loader: m.fxRatesLoader(client) }),
                  ),
                },
                {
                  path: 'settings/stress-policies',
                  ...screen(
                    () => import('./routes/settings/stress-policies'),
                    (m) => ({ Component: m.StressPoliciesRoute, loader: m.stressPoliciesLoader(client) }),
                  ),
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
                  ...screen(() => import('./routes/settings/billing'), (m) => ({ Component: m.BillingRoute, loader: m.billingLoader(client) })),
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
