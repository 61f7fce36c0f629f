import type { QueryClient } from '@tanstack/react-query';
import type { RouteObject } from 'react-router';
import { paths } from '../config/paths';
import { productionRoles } from '../config/roles';
import { jarsQueries } from '../features/jars/api/jars-queries';
import { RoleGate } from './sign-in-guard';

export const jarRoutes = (queryClient: QueryClient): RouteObject[] => [
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
];
