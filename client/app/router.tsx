import { createBrowserRouter, RouterProvider } from 'react-router-dom';
import { FullPageLoading } from './full-page-loading';
import { RouteError } from './route-error';

const router = createBrowserRouter([
  {
    ErrorBoundary: RouteError,
    HydrateFallback: FullPageLoading,
    children: [
      {
        lazy: () => import('./routes/auth-layout'),
        children: [
          { path: 'sign-in', lazy: () => import('./routes/sign-in') },
          { path: 'sign-up', lazy: () => import('./routes/sign-up') },
          { path: 'forgot', lazy: () => import('./routes/forgot') },
          { path: 'reset', lazy: () => import('./routes/reset') },
          { path: 'invite/:token', lazy: () => import('./routes/invite') },
        ],
      },
      { path: 'dev/inbox', lazy: () => import('./routes/dev-inbox') },
      // Run mode is full screen, outside the app frame.
      { path: 'run', lazy: () => import('./routes/run') },
      // The designer is full screen too: the canvas needs the width.
      { path: 'panels/:id/edit', lazy: () => import('./routes/panel-edit') },
      { path: 'panels/:id/run', lazy: () => import('./routes/run').then((m) => ({ Component: m.PanelRunComponent })) },
      { path: 'drills/follow', lazy: () => import('./routes/drills').then((m) => ({ Component: m.FollowComponent })) },
      { path: 'drills/:id/run', lazy: () => import('./routes/drills').then((m) => ({ Component: m.RunComponent })) },
      {
        path: '/',
        lazy: () => import('./routes/app-frame'),
        children: [
          { index: true, lazy: () => import('./routes/home') },
          { path: 'panels', lazy: () => import('./routes/panels') },
          { path: 'live', lazy: () => import('./routes/live') },
          { path: 'recordings', lazy: () => import('./routes/recordings') },
          { path: 'recordings/:id', lazy: () => import('./routes/recordings').then((m) => ({ Component: m.ReplayComponent })) },
          { path: 'cycles', lazy: () => import('./routes/cycles') },
          { path: 'drills', lazy: () => import('./routes/drills') },
          { path: 'drills/:id/send', lazy: () => import('./routes/drills').then((m) => ({ Component: m.SendComponent })) },
          { path: 'season', lazy: () => import('./routes/season') },
          { path: 'settings/team', lazy: () => import('./routes/team-settings') },
          { path: 'settings/robot', lazy: () => import('./routes/robot-settings') },
          { path: '*', lazy: () => import('./routes/not-found') },
        ],
      },
    ],
  },
]);

export function AppRouter() {
  return <RouterProvider router={router} />;
}
