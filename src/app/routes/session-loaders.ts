import { redirect } from 'react-router-dom';
import type { QueryClient } from '@tanstack/react-query';
import { meQueryOptions } from '../../features/auth/api';

/** Every signed-in screen: no session, no entry (on to /signin). */
export const requireSessionLoader = (queryClient: QueryClient) => async () => {
  const session = await queryClient.ensureQueryData({ ...meQueryOptions(), revalidateIfStale: true });
  if (!session) throw redirect('/signin');
  return null;
};

/** Someone already signed in has no business on sign-in or sign-up: on to the app. */
export const guestLoader = (queryClient: QueryClient) => async () => {
  try {
    const session = await queryClient.ensureQueryData(meQueryOptions());
    if (session) return redirect('/boms');
  } catch {
    // The session could not be read: show the form anyway; signing in will tell.
  }
  return null;
};
