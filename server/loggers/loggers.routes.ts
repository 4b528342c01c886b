import type { Sequelize } from 'sequelize';
import { idParam } from '../../shared/schemas/common';
import { loggerBody, loggerMoveBody, loggerPatch } from '../../shared/schemas/loggers';
import { created, defineRoute } from '../http/route';
import * as loggers from './loggers.service';

export function loggerRoutes(sequelize: Sequelize) {
  return [
    defineRoute({ method: 'get', path: '/loggers', access: 'viewer', handle: ({ auth }) => loggers.listLoggers(auth.nurseryId) }),
    defineRoute({
      method: 'get', path: '/loggers/:id', access: 'viewer', params: idParam,
      handle: ({ auth, params }) => loggers.getLogger(auth.nurseryId, params.id),
    }),
    defineRoute({
      method: 'post', path: '/loggers', access: 'staff', body: loggerBody,
      handle: async ({ auth, body }) => created(await loggers.createLogger(sequelize, auth.nurseryId, body)),
    }),
    defineRoute({
      method: 'patch', path: '/loggers/:id', access: 'staff', params: idParam, body: loggerPatch,
      handle: ({ auth, params, body }) => loggers.updateLogger(auth.nurseryId, params.id, body),
    }),
    defineRoute({
      method: 'post', path: '/loggers/:id/move', access: 'staff', params: idParam, body: loggerMoveBody,
      handle: ({ auth, params, body }) => loggers.moveLogger(sequelize, auth.nurseryId, params.id, body.roomId, body.at),
    }),
  ];
}
