import type { RouteObject } from 'react-router-dom';
import { SeasonIndexPage, SeasonReportPage } from './SeasonReportPage';
import { SeasonPrintPage } from './SeasonPrintPage';

/** Inside the signed-in app frame. */
export const seasonRoutes: RouteObject[] = [
  { path: 'season', element: <SeasonIndexPage /> },
  { path: 'season/:season', element: <SeasonReportPage /> },
];

/** Outside the app frame (no navigation on paper), but behind the session gate: wrap in <RequireSession>. */
export const seasonPrintRoutes: RouteObject[] = [{ path: '/season/:season/print', element: <SeasonPrintPage /> }];

export { BatchOutcomePanel } from './BatchOutcomePanel';
