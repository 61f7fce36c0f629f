import type { RouteObject } from 'react-router';
import { paths } from '../config/paths';
import { access } from '../config/roles';
import { RoleGate } from './sign-in-guard';

/** The lab's registers, each behind the roles that may open it. */
export const registerRoutes: RouteObject[] = [
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
        lazy: () => import('./routes/procedure-version').then((m) => ({ Component: m.ProcedureVersionRoute })),
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
];
