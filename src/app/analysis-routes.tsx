import type { RouteObject } from 'react-router';
import { paths } from '../config/paths';
import { access } from '../config/roles';
import { RoleGate } from './sign-in-guard';

export const analysisRoutes: RouteObject[] = [
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
];
