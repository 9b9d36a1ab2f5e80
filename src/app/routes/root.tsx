import { Suspense } from 'react';
import { Outlet, ScrollRestoration } from 'react-router-dom';
import { ReconnectingBanner } from '../../components/layouts/reconnecting-banner';
import { NavigationProgress } from '../../components/layouts/navigation-progress';
import { LoadingState } from '../../components/ui/loading-state';

/** Above every screen, signed in or not: the loading line and the reconnecting notice. */
export function RootLayout() {
  return (
    <>
      <NavigationProgress />
      <ReconnectingBanner />
      <Suspense fallback={<LoadingState />}>
        <Outlet />
      </Suspense>
      <ScrollRestoration />
    </>
  );
}
