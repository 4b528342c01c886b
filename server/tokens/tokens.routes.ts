import { idParam } from '../../shared/schemas/common';
import { tokenBody } from '../../shared/schemas/nursery';
import { created, defineRoute } from '../http/route';
import * as tokens from './tokens.service';

export function tokenRoutes() {
  return [
    defineRoute({ method: 'get', path: '/tokens', access: 'owner', handle: ({ auth }) => tokens.listTokens(auth.nurseryId) }),
    defineRoute({
      method: 'post', path: '/tokens', access: 'owner', body: tokenBody,
      handle: async ({ auth, body }) => created(await tokens.createToken(auth.nurseryId, auth.userId, body.name)),
    }),
    defineRoute({
      method: 'post', path: '/tokens/:id/revoke', access: 'owner', params: idParam,
      handle: ({ auth, params }) => tokens.revokeToken(auth.nurseryId, params.id),
    }),
  ];
}
