// The route table: which page answers which address. Pages live in routes/ and compose features.
import { createBrowserRouter, Outlet } from 'react-router';
import { RouterProvider } from 'react-router/dom';
import { RequireUser } from './features/auth/components/require-user';
import { AcceptInvitationRoute } from './routes/accept-invitation';
import { AccountRoute } from './routes/account';
import { AdminRoute } from './routes/admin';
import { AppLayout } from './routes/app-layout';
import { ConfirmEmailRoute } from './routes/confirm-email';
import { CopyFigureRoute } from './routes/copy-figure';
import { ForgotPasswordRoute } from './routes/forgot-password';
import { NotFoundRoute } from './routes/not-found';
import { ProjectAuditRoute } from './routes/project-audit';
import { ProjectDataRoute } from './routes/project-data';
import { ProjectExportsRoute } from './routes/project-exports';
import { ProjectFiguresRoute } from './routes/project-figures';
import { ProjectLayout } from './routes/project-layout';
import { ProjectMembersRoute } from './routes/project-members';
import { ProjectSettingsRoute } from './routes/project-settings';
import { ProjectsRoute } from './routes/projects';
import { ResetPasswordRoute } from './routes/reset-password';
import { RouteError } from './routes/route-error';
import { SignInRoute } from './routes/sign-in';
import { SignUpRoute } from './routes/sign-up';

const router = createBrowserRouter([
  {
    element: <Outlet />,
    errorElement: <RouteError />,
    children: [
      { path: '/sign-in', element: <SignInRoute /> },
      { path: '/sign-up', element: <SignUpRoute /> },
      { path: '/forgot-password', element: <ForgotPasswordRoute /> },
      { path: '/reset-password', element: <ResetPasswordRoute /> },
      { path: '/invitations/accept', element: <AcceptInvitationRoute /> },
      {
        element: (
          <RequireUser>
            <AppLayout />
          </RequireUser>
        ),
        errorElement: <RouteError />,
        children: [
          { path: '/', element: <ProjectsRoute /> },
          {
            path: '/projects/:projectId',
            element: <ProjectLayout />,
            children: [
              { index: true, element: <ProjectFiguresRoute /> },
              { path: 'members', element: <ProjectMembersRoute /> },
              { path: 'exports', element: <ProjectExportsRoute /> },
              { path: 'data', element: <ProjectDataRoute /> },
              { path: 'settings', element: <ProjectSettingsRoute /> },
              { path: 'audit', element: <ProjectAuditRoute /> },
            ],
          },
          {
            path: '/figures/:figureId',
            // Its own chunk: the figure page will carry the 3D composer (three.js) with it.
            lazy: () => import('./routes/figure').then((m) => ({ Component: m.FigureRoute })),
          },
          { path: '/figures/:figureId/copy', element: <CopyFigureRoute /> },
          { path: '/admin', element: <AdminRoute /> },
          { path: '/account', element: <AccountRoute /> },
          { path: '/confirm-email', element: <ConfirmEmailRoute /> },
          { path: '*', element: <NotFoundRoute /> },
        ],
      },
    ],
  },
]);

export function AppRouter() {
  return <RouterProvider router={router} />;
}
