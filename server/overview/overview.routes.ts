import type { Pool } from 'mariadb';
import { defineRoute } from '../http/route';
import { nurseryOverview } from './overview.service';

export function overviewRoutes(pool: Pool) {
  return [defineRoute({ method: 'get', path: '/overview', access: 'viewer', handle: ({ auth }) => nurseryOverview(pool, auth.nurseryId) })];
}
