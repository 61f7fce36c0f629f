import { useQueryClient, type QueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { createBrowserRouter, redirect, RouterProvider, type LoaderFunctionArgs } from 'react-router';
import { RouteError } from '../components/errors/route-error';
import { FullPageSpinner } from '../components/ui/spinner';
import { paths, safeReturnPath } from '../config/paths';
import { access } from '../config/roles';
import { authQueries } from '../features/auth/api/auth-queries';
import { RoleGate, SessionLayout, sessionLoader } from './session-guard';

/** Someone already signed in who opens the sign-in page goes straight on. */
const signInLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const me = await queryClient.ensureQueryData(authQueries.me()).catch(() => null);
    if (me) throw redirect(safeReturnPath(new URL(request.url).searchParams.get('next')));
    return null;
  };

export function createAppRouter(queryClient: QueryClient) {
  return createBrowserRouter([
    {
      HydrateFallback: FullPageSpinner,
      errorElement: <RouteError />,
      children: [
        {
          path: paths.signIn.pattern,
          loader: signInLoader(queryClient),
          lazy: () => import('./routes/sign-in').then((m) => ({ Component: m.SignInRoute })),
        },
        {
          loader: sessionLoader(queryClient),
          element: <SessionLayout />,
          children: [
            {
              // A failing screen shows its error inside the layout, so navigation stays usable.
              errorElement: <RouteError />,
              children: [
                { index: true, lazy: () => import('./routes/home').then((m) => ({ Component: m.HomeRoute })) },
                {
                  path: paths.account.pattern,
                  lazy: () => import('./routes/account').then((m) => ({ Component: m.AccountRoute })),
                },
                {
                  path: paths.users.pattern,
                  element: <RoleGate roles={access.users} />,
                  children: [
                    { index: true, lazy: () => import('./routes/users').then((m) => ({ Component: m.UsersRoute })) },
                  ],
                },
                { path: '*', lazy: () => import('./routes/not-found').then((m) => ({ Component: m.NotFoundRoute })) },
              ],
            },
          ],
        },
      ],
    },
  ]);
}

export function AppRouter() {
  const queryClient = useQueryClient();
  const [router] = useState(() => createAppRouter(queryClient));
  return <RouterProvider router={router} />;
}
