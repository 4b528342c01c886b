import type { RouteObject } from 'react-router-dom';
import { OverviewPage } from './OverviewPage';

export const overviewRoutes: RouteObject[] = [{ path: 'overview', element: <OverviewPage /> }];
