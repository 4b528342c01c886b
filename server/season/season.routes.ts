import type { Pool } from 'mariadb';
import type { Sequelize } from 'sequelize';
import { idParam } from '../../shared/schemas/common';
import { assessmentBody, assessmentPatch, plantingBody, plantingPatch, reportQuery, seasonParam } from '../../shared/season/schemas';
import { created, defineRoute, noContent } from '../http/route';
import * as assessments from './assessments.service';
import { getBatchOutcome } from './batchOutcome.service';
import * as plantings from './plantings.service';
import { listSeasons, seasonExport, seasonReport } from './seasonReport.service';

/** A UTF-8 byte-order mark: without it some spreadsheets read the export's "°C·h" headers as Latin-1. */
const BOM = '\uFEFF';

export function seasonRoutes(sequelize: Sequelize, pool: Pool) {
  return [
    defineRoute({
      method: 'get', path: '/batches/:id/outcome', access: 'viewer', params: idParam,
      handle: ({ auth, params }) => getBatchOutcome(auth.nurseryId, params.id),
    }),
    defineRoute({
      method: 'post', path: '/batches/:id/plantings', access: 'staff', params: idParam, body: plantingBody,
      handle: async ({ auth, params, body }) => created(await plantings.createPlanting(sequelize, pool, auth.nurseryId, params.id, body)),
    }),
    defineRoute({
      method: 'patch', path: '/plantings/:id', access: 'staff', params: idParam, body: plantingPatch,
      handle: ({ auth, params, body }) => plantings.updatePlanting(sequelize, auth.nurseryId, params.id, body),
    }),
    defineRoute({
      method: 'delete', path: '/plantings/:id', access: 'staff', params: idParam,
      async handle({ auth, params }) {
        await plantings.deletePlanting(sequelize, auth.nurseryId, params.id);
        return noContent();
      },
    }),
    defineRoute({
      method: 'post', path: '/batches/:id/assessments', access: 'staff', params: idParam, body: assessmentBody,
      handle: async ({ auth, params, body }) => created(await assessments.createAssessment(sequelize, auth.nurseryId, params.id, body)),
    }),
    defineRoute({
      method: 'patch', path: '/assessments/:id', access: 'staff', params: idParam, body: assessmentPatch,
      handle: ({ auth, params, body }) => assessments.updateAssessment(sequelize, auth.nurseryId, params.id, body),
    }),
    defineRoute({
      method: 'delete', path: '/assessments/:id', access: 'staff', params: idParam,
      async handle({ auth, params }) {
        await assessments.deleteAssessment(auth.nurseryId, params.id);
        return noContent();
      },
    }),
    defineRoute({ method: 'get', path: '/seasons', access: 'viewer', handle: ({ auth }) => listSeasons(auth.nurseryId) }),
    defineRoute({
      method: 'get', path: '/seasons/:season/report', access: 'viewer', params: seasonParam, query: reportQuery,
      handle: ({ auth, params, query }) => seasonReport(auth.nurseryId, params.season, query.unit),
    }),
    defineRoute({
      method: 'get', path: '/seasons/:season/export', access: 'viewer', params: seasonParam, query: reportQuery,
      async handle({ auth, params, query, res }) {
        const csv = await seasonExport(auth.nurseryId, params.season, query.unit);
        res.type('text/csv; charset=utf-8; header=present');
        res.attachment(`coldknit-season-${params.season}.csv`);
        res.send(BOM + csv);
      },
    }),
  ];
}
