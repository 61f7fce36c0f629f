import { useQueryClient, type QueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { createBrowserRouter, RouterProvider } from 'react-router';
import { RouteError } from '../components/errors/route-error';
import { FullPageSpinner } from '../components/ui/spinner';
import { paths } from '../config/paths';
import { access } from '../config/roles';
import { analysisRoutes } from './analysis-routes';
import { authRoutes } from './auth-routes';
import { jarRoutes } from './jar-routes';
import { registerRoutes } from './register-routes';
import { RoleGate, SignedInLayout, signedInLoader } from './sign-in-guard';

export function createAppRouter(queryClient: QueryClient) {
  return createBrowserRouter([
    {
      HydrateFallback: FullPageSpinner,
      errorElement: <RouteError />,
      children: [
        ...authRoutes(queryClient),
        {
          loader: signedInLoader(queryClient),
          element: <SignedInLayout />,
          children: [
            {
              // A failing screen shows its error inside the layout, so navigation stays usable.
              errorElement: <RouteError />,
              children: [
                { index: true, lazy: () => import('./routes/home').then((m) => ({ Component: m.HomeRoute })) },
                {
                  path: paths.scan.pattern,
                  lazy: () => import('./routes/scan').then((m) => ({ Component: m.ScanRoute })),
                },
                {
                  path: paths.outbox.pattern,
                  lazy: () => import('./routes/outbox').then((m) => ({ Component: m.OutboxRoute })),
                },
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
                ...registerRoutes,
                {
                  path: paths.mailPreferences.pattern,
                  lazy: () => import('./routes/mail-preferences').then((m) => ({ Component: m.MailPreferencesRoute })),
                },
                {
                  element: <RoleGate roles={access.sentMail} />,
                  children: [
                    {
                      path: paths.sentMail.pattern,
                      lazy: () => import('./routes/sent-mail').then((m) => ({ Component: m.SentMailRoute })),
                    },
                  ],
                },
                ...jarRoutes(queryClient),
                ...analysisRoutes,
                {
                  element: <RoleGate roles={access.labSettings} />,
                  children: [
                    {
                      path: paths.labSettings.pattern,
                      lazy: () => import('./routes/lab-settings').then((m) => ({ Component: m.LabSettingsRoute })),
                    },
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
