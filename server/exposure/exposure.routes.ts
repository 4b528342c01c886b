import type { Pool } from 'mariadb';
import { idParam } from '../../shared/schemas/common';
import { defineRoute } from '../http/route';
import { batchExposure, nurseryExposure } from './exposure.service';

export function exposureRoutes(pool: Pool) {
  return [
    defineRoute({
      method: 'get', path: '/batches/:id/exposure', access: 'viewer', params: idParam,
      handle: ({ auth, params }) => batchExposure(pool, auth.nurseryId, params.id),
    }),
    defineRoute({ method: 'get', path: '/exposure/batches', access: 'viewer', handle: ({ auth }) => nurseryExposure(pool, auth.nurseryId) }),
  ];
}
