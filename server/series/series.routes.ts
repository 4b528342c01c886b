import type { Pool } from 'mariadb';
import { idParam } from '../../shared/schemas/common';
import { dailyQuery, seriesQuery } from '../../shared/schemas/series';
import { defineRoute } from '../http/route';
import { dailyExtremes } from './dailyExtremes';
import { roomSeries } from './roomSeries';

export function seriesRoutes(pool: Pool) {
  return [
    defineRoute({
      method: 'get', path: '/rooms/:id/series', access: 'viewer', params: idParam, query: seriesQuery,
      handle: ({ auth, params, query }) => roomSeries(pool, auth.nurseryId, params.id, query),
    }),
    defineRoute({
      method: 'get', path: '/rooms/:id/daily', access: 'viewer', params: idParam, query: dailyQuery,
      handle: ({ auth, params, query }) => dailyExtremes(pool, auth.nurseryId, params.id, query),
    }),
  ];
}
