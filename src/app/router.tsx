import { useQueryClient, type QueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { createBrowserRouter, redirect, RouterProvider, type LoaderFunctionArgs } from 'react-router';
import { RouteError } from '../components/errors/route-error';
import { FullPageSpinner } from '../components/ui/spinner';
import { paths, safeReturnPath } from '../config/paths';
import { access, productionRoles } from '../config/roles';
import { authQueries } from '../features/auth/api/auth-queries';
import { jarsQueries } from '../features/jars/api/jars-queries';
import { RoleGate, SessionLayout, sessionLoader } from './session-guard';

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
          path: paths.setPassword.pattern,
          loader: setPasswordLoader(queryClient),
          lazy: () => import('./routes/set-password').then((m) => ({ Component: m.SetPasswordRoute })),
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
                {
                  element: <RoleGate roles={access.cookRuns} />,
                  children: [
                    {
                      path: paths.cookRuns.pattern,
                      lazy: () => import('./routes/cook-runs').then((m) => ({ Component: m.CookRunsRoute })),
                    },
                    {
                      path: paths.cookRun.pattern,
                      lazy: () => import('./routes/cook-run').then((m) => ({ Component: m.CookRunRoute })),
                    },
                  ],
                },
                {
                  element: <RoleGate roles={access.cultures} />,
                  children: [
                    {
                      path: paths.cultures.pattern,
                      lazy: () => import('./routes/cultures').then((m) => ({ Component: m.CulturesRoute })),
                    },
                    {
                      path: paths.culture.pattern,
                      lazy: () => import('./routes/culture').then((m) => ({ Component: m.CultureRoute })),
                    },
                  ],
                },
                {
                  element: <RoleGate roles={access.sessions} />,
                  children: [
                    {
                      path: paths.sessions.pattern,
                      lazy: () => import('./routes/sessions').then((m) => ({ Component: m.SessionsRoute })),
                    },
                    {
                      path: paths.session.pattern,
                      lazy: () => import('./routes/session').then((m) => ({ Component: m.SessionRoute })),
                    },
                  ],
                },
                {
                  element: <RoleGate roles={access.grain} />,
                  children: [
                    {
                      path: paths.grain.pattern,
                      lazy: () => import('./routes/grain').then((m) => ({ Component: m.GrainRoute })),
                    },
                  ],
                },
                {
                  element: <RoleGate roles={access.incidents} />,
                  children: [
                    {
                      path: paths.incidents.pattern,
                      lazy: () => import('./routes/incidents').then((m) => ({ Component: m.IncidentsRoute })),
                    },
                    {
                      path: paths.incident.pattern,
                      lazy: () => import('./routes/incident').then((m) => ({ Component: m.IncidentRoute })),
                    },
                  ],
                },
                {
                  element: <RoleGate roles={access.actions} />,
                  children: [
                    {
                      path: paths.actions.pattern,
                      lazy: () => import('./routes/actions').then((m) => ({ Component: m.ActionsRoute })),
                    },
                  ],
                },
                {
                  element: <RoleGate roles={access.flagJar} />,
                  children: [
                    {
                      path: paths.flagJar.pattern,
                      lazy: () => import('./routes/flag-jar').then((m) => ({ Component: m.FlagJarRoute })),
                    },
                  ],
                },
                {
                  element: <RoleGate roles={access.historyImport} />,
                  children: [
                    {
                      path: paths.historyImport.pattern,
                      lazy: () => import('./routes/history-import').then((m) => ({ Component: m.HistoryImportRoute })),
                    },
                  ],
                },
                {
                  element: <RoleGate roles={access.procedures} />,
                  children: [
                    {
                      path: paths.procedures.pattern,
                      lazy: () => import('./routes/procedures').then((m) => ({ Component: m.ProceduresRoute })),
                    },
                    {
                      path: paths.procedureVersion.pattern,
                      lazy: () =>
                        import('./routes/procedure-version').then((m) => ({ Component: m.ProcedureVersionRoute })),
                    },
                    {
                      path: paths.procedure.pattern,
                      lazy: () => import('./routes/procedure').then((m) => ({ Component: m.ProcedureRoute })),
                    },
                  ],
                },
                {
                  element: <RoleGate roles={access.training} />,
                  children: [
                    {
                      path: paths.training.pattern,
                      lazy: () => import('./routes/training').then((m) => ({ Component: m.TrainingRoute })),
                    },
                  ],
                },
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
                {
                  path: paths.jars.pattern,
                  lazy: () => import('./routes/jars').then((m) => ({ Component: m.JarsRoute })),
                },
                {
                  path: paths.jarPage.pattern,
                  // Asks for the jar while the screen's code and the session check are still on their way:
                  // on a weak signal every round trip saved is half a second.
                  loader: ({ params }) => {
                    if (params.label) void queryClient.prefetchQuery(jarsQueries.byLabel(params.label.trim()));
                    return null;
                  },
                  lazy: () => import('./routes/jar').then((m) => ({ Component: m.JarRoute })),
                },
                {
                  path: paths.jarLabels.pattern,
                  lazy: () => import('./routes/jar-labels').then((m) => ({ Component: m.JarLabelsRoute })),
                },
                {
                  path: paths.lineage.pattern,
                  lazy: () => import('./routes/lineage').then((m) => ({ Component: m.LineageRoute })),
                },
                {
                  element: <RoleGate roles={productionRoles.write} />,
                  children: [
                    {
                      path: paths.newJars.pattern,
                      lazy: () => import('./routes/jars-new').then((m) => ({ Component: m.NewJarsRoute })),
                    },
                    {
                      path: paths.shelfWalk.pattern,
                      lazy: () => import('./routes/shelf-walk').then((m) => ({ Component: m.ShelfWalkRoute })),
                    },
                  ],
                },
                {
                  element: <RoleGate roles={access.analysis} />,
                  children: [
                    {
                      path: paths.analysisWeekly.pattern,
                      lazy: () => import('./routes/analysis').then((m) => ({ Component: m.AnalysisWeeklyRoute })),
                    },
                    {
                      path: paths.analysisCauses.pattern,
                      lazy: () => import('./routes/analysis').then((m) => ({ Component: m.AnalysisCausesRoute })),
                    },
                    {
                      path: paths.analysisRates.pattern,
                      lazy: () => import('./routes/analysis').then((m) => ({ Component: m.AnalysisRatesRoute })),
                    },
                    {
                      path: paths.analysisCrosstab.pattern,
                      lazy: () => import('./routes/analysis').then((m) => ({ Component: m.AnalysisCrosstabRoute })),
                    },
                    {
                      path: paths.analysisColonisation.pattern,
                      lazy: () => import('./routes/analysis').then((m) => ({ Component: m.AnalysisColonisationRoute })),
                    },
                    {
                      path: paths.analysisLethality.pattern,
                      lazy: () => import('./routes/analysis').then((m) => ({ Component: m.AnalysisLethalityRoute })),
                    },
                    {
                      path: paths.analysisActions.pattern,
                      lazy: () => import('./routes/analysis').then((m) => ({ Component: m.AnalysisActionsRoute })),
                    },
                    {
                      path: paths.analysisJars.pattern,
                      lazy: () => import('./routes/analysis').then((m) => ({ Component: m.AnalysisJarsRoute })),
                    },
                  ],
                },
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
