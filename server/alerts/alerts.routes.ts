import type { Sequelize } from 'sequelize';
import { alertListQuery, nurseryThresholdsPatch, roomThresholdsPatch, subscriptionsBody } from '../../shared/schemas/alerts';
import { idParam } from '../../shared/schemas/common';
import { defineRoute, noContent } from '../http/route';
import * as alerts from './alerts.service';
import * as settings from './settings.service';
import * as subscriptions from './subscriptions.service';

export function alertRoutes(sequelize: Sequelize) {
  return [
    defineRoute({
      method: 'get', path: '/alerts', access: 'viewer', query: alertListQuery,
      handle: ({ auth, query }) => alerts.listAlerts(auth.nurseryId, query),
    }),
    defineRoute({ method: 'get', path: '/alerts/summary', access: 'viewer', handle: ({ auth }) => alerts.alertSummary(auth.nurseryId) }),
    defineRoute({
      method: 'get', path: '/alerts/:id', access: 'viewer', params: idParam,
      handle: ({ auth, params }) => alerts.getAlert(auth.nurseryId, params.id),
    }),
    defineRoute({
      method: 'post', path: '/alerts/:id/acknowledge', access: 'staff', params: idParam,
      handle: ({ auth, params }) => alerts.acknowledgeAlert(sequelize, auth.nurseryId, params.id, auth.userId),
    }),
    defineRoute({ method: 'get', path: '/alert-settings', access: 'viewer', handle: ({ auth }) => settings.getAlertSettings(auth.nurseryId) }),
    defineRoute({
      method: 'patch', path: '/alert-settings', access: 'owner', body: nurseryThresholdsPatch,
      handle: ({ auth, body }) => settings.patchNurseryThresholds(auth.nurseryId, body, auth.userId),
    }),
    defineRoute({
      method: 'patch', path: '/alert-settings/rooms/:id', access: 'owner', params: idParam, body: roomThresholdsPatch,
      handle: ({ auth, params, body }) => settings.patchRoomThresholds(auth.nurseryId, params.id, body, auth.userId),
    }),
    defineRoute({
      method: 'delete', path: '/alert-settings/rooms/:id', access: 'owner', params: idParam,
      async handle({ auth, params }) {
        await settings.clearRoomThresholds(auth.nurseryId, params.id);
        return noContent();
      },
    }),
    defineRoute({ method: 'get', path: '/alert-subscriptions', access: 'viewer', handle: ({ auth }) => subscriptions.getMySubscriptions(auth) }),
    defineRoute({
      method: 'patch', path: '/alert-subscriptions', access: 'viewer', body: subscriptionsBody,
      handle: ({ auth, body }) => subscriptions.patchMySubscriptions(auth, body),
    }),
  ];
}
