import type { Pool } from 'mariadb';
import { idParam } from '../../shared/schemas/common';
import { importListQuery, importSettings } from '../../shared/schemas/imports';
import { badRequest } from '../http/errors';
import { created, defineRoute } from '../http/route';
import { getImport, importFile, listImports } from './imports.service';
import type { Reader } from './readerThread';
import { readerAhead, singleFileUpload } from './upload';

export function importRoutes(pool: Pool) {
  return [
    defineRoute({
      method: 'get', path: '/imports', access: 'viewer', query: importListQuery,
      handle: ({ auth, query }) => listImports(auth.nurseryId, query),
    }),
    defineRoute({
      method: 'get', path: '/imports/:id', access: 'viewer', params: idParam,
      handle: ({ auth, params }) => getImport(auth.nurseryId, params.id),
    }),
    defineRoute({
      // Multipart: the file in `file`, settings as fields. `dryRun` reads and reports without storing (the preview).
      method: 'post', path: '/imports', access: 'staff', tokens: true, body: importSettings, before: [readerAhead, ...singleFileUpload()],
      async handle({ auth, body, req, res }) {
        if (!req.file) throw badRequest('file_missing', 'Attach the logger file in the form field "file".');
        const result = await importFile(pool, auth, { path: req.file.path, name: req.file.originalname }, body, res.locals.reader as Reader);
        return result.dryRun || result.alreadyImported ? result : created(result);
      },
    }),
  ];
}
