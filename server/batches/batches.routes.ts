import type { Sequelize } from 'sequelize';
import { idParam } from '../../shared/schemas/common';
import { batchBody, batchLeaveBody, batchListQuery, batchMoveBody, batchPatch, bulkBatchBody } from '../../shared/schemas/batches';
import { created, defineRoute } from '../http/route';
import { leaveStorage, moveBatch } from './batchMoves.service';
import * as batches from './batches.service';

export function batchRoutes(sequelize: Sequelize) {
  return [
    defineRoute({
      method: 'get', path: '/batches', access: 'viewer', query: batchListQuery,
      handle: ({ auth, query }) => batches.listBatches(auth.nurseryId, query),
    }),
    defineRoute({
      method: 'get', path: '/batches/:id', access: 'viewer', params: idParam,
      handle: ({ auth, params }) => batches.getBatch(auth.nurseryId, params.id),
    }),
    defineRoute({
      method: 'post', path: '/batches', access: 'staff', body: batchBody,
      handle: async ({ auth, body }) => created(await batches.createBatch(sequelize, auth.nurseryId, body)),
    }),
    defineRoute({
      method: 'post', path: '/batches/bulk', access: 'staff', body: bulkBatchBody,
      handle: async ({ auth, body }) => created(await batches.createBatchDay(sequelize, auth.nurseryId, body)),
    }),
    defineRoute({
      method: 'patch', path: '/batches/:id', access: 'staff', params: idParam, body: batchPatch,
      handle: ({ auth, params, body }) => batches.updateBatch(auth.nurseryId, params.id, body),
    }),
    defineRoute({
      method: 'post', path: '/batches/:id/move', access: 'staff', params: idParam, body: batchMoveBody,
      handle: ({ auth, params, body }) => moveBatch(sequelize, auth.nurseryId, params.id, body.roomId, body.at),
    }),
    defineRoute({
      method: 'post', path: '/batches/:id/discard', access: 'staff', params: idParam, body: batchLeaveBody,
      handle: ({ auth, params, body }) => leaveStorage(sequelize, auth.nurseryId, params.id, 'discarded', body.at, body.note),
    }),
    defineRoute({
      method: 'post', path: '/batches/:id/plant-out', access: 'staff', params: idParam, body: batchLeaveBody,
      handle: ({ auth, params, body }) => leaveStorage(sequelize, auth.nurseryId, params.id, 'planted_out', body.at, body.note),
    }),
  ];
}
