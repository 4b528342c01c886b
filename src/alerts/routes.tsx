import type { RouteObject } from 'react-router-dom';
import { AlertPage } from './AlertPage';
import { AlertSettingsPage } from './AlertSettingsPage';
import { AlertsPage } from './AlertsPage';

/** Inside the signed-in app frame. `RoomAlertHistory` (./RoomAlertHistory) is the room page's panel. */
export const alertRoutes: RouteObject[] = [
  { path: 'alerts', element: <AlertsPage /> },
  { path: 'alerts/settings', element: <AlertSettingsPage /> },
  { path: 'alerts/:id', element: <AlertPage /> },
];
