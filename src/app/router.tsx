import { createBrowserRouter } from 'react-router-dom';
import { paths } from './paths';
import { RootLayout } from './routes/root-layout';
import { RouteError } from './routes/route-error';

/** Loads a route module only when its page is first visited, so the first page stays light. */
const page = (load: () => Promise<{ default: React.ComponentType }>) => async () => ({ Component: (await load()).default });

export const router = createBrowserRouter([
  {
    path: paths.home.pattern,
    Component: RootLayout,
    ErrorBoundary: RouteError,
    children: [
      { index: true, lazy: page(() => import('./routes/home')) },
      { path: paths.signIn.pattern, lazy: page(() => import('./routes/sign-in')) },
      { path: paths.signUp.pattern, lazy: page(() => import('./routes/sign-up')) },
      { path: paths.invitation.pattern, lazy: page(() => import('./routes/invitation')) },
      { path: paths.workspaces.pattern, lazy: page(() => import('./routes/workspaces')) },
      {
        path: paths.workspace.pattern,
        lazy: page(() => import('./routes/workspace-layout')),
        children: [
          { index: true, lazy: page(() => import('./routes/workspace-index')) },
          { path: paths.scenarios.pattern, lazy: page(() => import('./routes/scenarios')) },
          { path: paths.scenario.pattern, lazy: page(() => import('./routes/scenario-editor')) },
          { path: paths.scenarioHistory.pattern, lazy: page(() => import('./routes/scenario-history')) },
          { path: paths.scenarioSensitivity.pattern, lazy: page(() => import('./routes/scenario-sensitivity')) },
          { path: paths.fixtures.pattern, lazy: page(() => import('./routes/fixtures')) },
          { path: paths.measurements.pattern, lazy: page(() => import('./routes/measurements')) },
          { path: paths.measurement.pattern, lazy: page(() => import('./routes/measurement')) },
          { path: paths.settings.pattern, lazy: page(() => import('./routes/settings')) },
        ],
      },
      { path: paths.admin.pattern, lazy: page(() => import('./routes/admin')) },
      { path: paths.sharedSnapshot.pattern, lazy: page(() => import('./routes/shared-snapshot')) },
      { path: '*', lazy: page(() => import('./routes/not-found')) },
    ],
  },
]);
