import type { QueryClient } from '@tanstack/react-query';
import { redirect, type LoaderFunctionArgs, type RouteObject } from 'react-router';
import { paths, safeReturnPath } from '../config/paths';
import { authQueries } from '../features/auth/api/auth-queries';

/** Someone already signed in who opens the sign-in page goes straight on. */
const signInLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const me = await queryClient.ensureQueryData(authQueries.me()).catch(() => null);
    if (me) throw redirect(safeReturnPath(new URL(request.url).searchParams.get('next')));
    return null;
  };

/** Only a person whose password was reset stays here; anyone else goes home or signs in. */
const setPasswordLoader = (queryClient: QueryClient) => async () => {
  const me = await queryClient.ensureQueryData(authQueries.me()).catch(() => null);
  if (!me) throw redirect(paths.signIn.to());
  if (!me.mustChangePassword) throw redirect(paths.home.to());
  return null;
};
/** The screens open without a session. */
export const authRoutes = (queryClient: QueryClient): RouteObject[] => [
  {
    path: paths.signIn.pattern,
    loader: signInLoader(queryClient),
    lazy: () => import('./routes/sign-in').then((m) => ({ Component: m.SignInRoute })),
  },
  {
    path: paths.setPassword.pattern,
    loader: setPasswordLoader(queryClient),
    lazy: () => import('./routes/set-password').then((m) => ({ Component: m.SetPasswordRoute })),
  },
];
