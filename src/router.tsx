import { createBrowserRouter, Navigate, Outlet, ScrollRestoration } from 'react-router-dom';
import { AccountPage } from './account/AccountPage';
import { AcceptInvitationPage } from './auth/AcceptInvitationPage';
import { RedirectIfSignedIn, RequireSession } from './auth/RequireSession';
import { SignInPage } from './auth/SignInPage';
import { SignUpPage } from './auth/SignUpPage';
import { CapturedMailPage } from './devmail/CapturedMailPage';
import { AppFrame } from './layout/AppFrame';
import { NotFoundPage } from './layout/NotFoundPage';
import { PlainFrame } from './layout/PlainFrame';
import { RouteErrorPage } from './layout/RouteErrorPage';
import { EditLoggerPage } from './loggers/EditLoggerPage';
import { LoggerPage } from './loggers/LoggerPage';
import { LoggersPage } from './loggers/LoggersPage';
import { NewLoggerPage } from './loggers/NewLoggerPage';
import { EditRoomPage } from './rooms/EditRoomPage';
import { NewRoomPage } from './rooms/NewRoomPage';
import { RoomPage } from './rooms/RoomPage';
import { RoomsPage } from './rooms/RoomsPage';
import { SettingsPage } from './settings/SettingsPage';
import { alertRoutes } from './alerts/routes';
import { batchRoutes } from './batches/routes';
import { importRoutes } from './imports/routes';
import { MoreSectionsPage } from './layout/MoreSectionsPage';
import { overviewRoutes } from './overview/routes';
import { profileRoutes } from './profiles/routes';
import { seasonPrintRoutes, seasonRoutes } from './season/routes';

function Root() {
  return (
    <>
      <ScrollRestoration />
      <Outlet />
    </>
  );
}

export const router = createBrowserRouter([
  {
    element: <Root />,
    errorElement: <RouteErrorPage />,
    children: [
      { path: '/sign-in', element: <RedirectIfSignedIn><SignInPage /></RedirectIfSignedIn> },
      { path: '/sign-up', element: <RedirectIfSignedIn><SignUpPage /></RedirectIfSignedIn> },
      { path: '/invite/:token', element: <AcceptInvitationPage /> },
      { path: '/dev/mail/:mailId?', element: <PlainFrame><CapturedMailPage /></PlainFrame> },
      ...seasonPrintRoutes.map((r) => ({ ...r, element: <RequireSession>{r.element}</RequireSession> })),
      {
        element: <RequireSession><AppFrame /></RequireSession>,
        children: [
          { index: true, element: <Navigate to="/overview" replace /> },
          ...overviewRoutes,
          { path: 'rooms', element: <RoomsPage /> },
          { path: 'rooms/new', element: <NewRoomPage /> },
          { path: 'rooms/:id', element: <RoomPage /> },
          { path: 'rooms/:id/edit', element: <EditRoomPage /> },
          { path: 'loggers', element: <LoggersPage /> },
          { path: 'loggers/new', element: <NewLoggerPage /> },
          { path: 'loggers/:id', element: <LoggerPage /> },
          { path: 'loggers/:id/edit', element: <EditLoggerPage /> },
          ...batchRoutes,
          ...profileRoutes,
          ...importRoutes,
          ...alertRoutes,
          ...seasonRoutes,
          { path: 'more', element: <MoreSectionsPage /> },
          { path: 'settings', element: <SettingsPage /> },
          { path: 'account', element: <AccountPage /> },
          { path: '*', element: <NotFoundPage /> },
        ],
      },
    ],
  },
]);
