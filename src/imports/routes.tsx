import type { RouteObject } from 'react-router-dom';
import { ImportPage } from './ImportPage';
import { ImportsPage } from './ImportsPage';

export const importRoutes: RouteObject[] = [
  { path: 'imports', element: <ImportsPage /> },
  { path: 'imports/:id', element: <ImportPage /> },
];
