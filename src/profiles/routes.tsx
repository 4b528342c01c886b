import type { RouteObject } from 'react-router-dom';
import { EditProfilePage } from './EditProfilePage';
import { ProfilesPage } from './ProfilesPage';

/** Inside the signed-in app frame; editing is for owners (the server refuses others). */
export const profileRoutes: RouteObject[] = [
  { path: 'profiles', element: <ProfilesPage /> },
  { path: 'profiles/:key/edit', element: <EditProfilePage /> },
];
