import type { RouteObject } from 'react-router-dom';
import { BatchesPage } from './BatchesPage';
import { BatchPage } from './BatchPage';
import { EditBatchPage } from './EditBatchPage';
import { GraftingDayPage } from './GraftingDayPage';
import { StoredExposurePage } from './StoredExposurePage';

/** Inside the signed-in app frame. */
export const batchRoutes: RouteObject[] = [
  { path: 'batches', element: <BatchesPage /> },
  { path: 'batches/grafting-day', element: <GraftingDayPage /> },
  { path: 'batches/exposure', element: <StoredExposurePage /> },
  { path: 'batches/:id', element: <BatchPage /> },
  { path: 'batches/:id/edit', element: <EditBatchPage /> },
];
