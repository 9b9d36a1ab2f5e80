import { Navigate, isRouteErrorResponse, useRevalidator, useRouteError } from 'react-router-dom';
import { useQueryErrorResetBoundary } from '@tanstack/react-query';
import { isApiError } from '../../lib/api-client';
import { ErrorState } from '../../components/ui/error-state';
import { Wordmark } from '../../components/ui/wordmark';
import { NotFoundRoute } from './not-found';

/**
 * What a screen shows when its data could not be loaded or it failed to render.
 * An ended session goes to sign-in; anything else offers to try again, which clears
 * TanStack Query's error and runs the route's loaders once more.
 */
export function RouteError({ fullPage = false }: { fullPage?: boolean }) {
  const error = useRouteError();
  const revalidator = useRevalidator();
  const { reset } = useQueryErrorResetBoundary();

  if (isApiError(error) && error.status === 401) return <Navigate to="/signin" replace />;

  let content;
  if ((isRouteErrorResponse(error) && error.status === 404) || (isApiError(error) && error.status === 404)) {
    content = <NotFoundRoute />;
  } else if (isApiError(error) && error.status === 403) {
    content = <ErrorState title="Your role does not give access to this page" error={error} />;
  } else {
    content = (
      <ErrorState
        error={error}
        onRetry={() => {
          reset();
          void revalidator.revalidate();
        }}
      />
    );
  }

  if (!fullPage) return content;
  return (
    <div className="mx-auto flex min-h-screen max-w-2xl flex-col gap-8 px-6 py-12">
      <Wordmark />
      <main>{content}</main>
    </div>
  );
}
