import type { Sequelize } from 'sequelize';
import { acceptInviteBody, inviteBody, inviteTokenParam, userRoleBody } from '../../shared/schemas/auth';
import { idParam } from '../../shared/schemas/common';
import type { AppConfig } from '../config';
import { issueSession } from '../auth/session';
import { currentUser } from '../auth/auth.service';
import { created, defineRoute, noContent } from '../http/route';
import type { Mailer } from '../mail/mailer';
import * as users from './users.service';

export function userRoutes(config: AppConfig, sequelize: Sequelize, mailer: Mailer) {
  return [
    defineRoute({ method: 'get', path: '/users', access: 'owner', handle: ({ auth }) => users.listUsers(auth.nurseryId) }),
    defineRoute({
      method: 'patch', path: '/users/:id', access: 'owner', params: idParam, body: userRoleBody,
      handle: ({ auth, params, body }) => users.changeRole(auth.nurseryId, params.id, body.role),
    }),
    defineRoute({
      method: 'delete', path: '/users/:id', access: 'owner', params: idParam,
      async handle({ auth, params }) {
        await users.removeUser(auth.nurseryId, params.id);
        return noContent();
      },
    }),
    defineRoute({ method: 'get', path: '/invitations', access: 'owner', handle: ({ auth }) => users.listInvitations(auth.nurseryId) }),
    defineRoute({
      method: 'post', path: '/invitations', access: 'owner', body: inviteBody,
      handle: async ({ auth, body }) =>
        created(await users.invite({ mailer, appOrigin: config.appOrigin }, auth.nurseryId, auth.userId!, body)),
    }),
    defineRoute({
      method: 'delete', path: '/invitations/:id', access: 'owner', params: idParam,
      async handle({ auth, params }) {
        await users.cancelInvitation(auth.nurseryId, params.id);
        return noContent();
      },
    }),
    defineRoute({
      method: 'get', path: '/invitations/token/:token', access: 'public', params: inviteTokenParam,
      handle: ({ params }) => users.describeInvitation(params.token),
    }),
    defineRoute({
      method: 'post', path: '/invitations/token/:token/accept', access: 'public', params: inviteTokenParam, body: acceptInviteBody,
      async handle({ params, body, res }) {
        const user = await users.acceptInvitation(sequelize, params.token, body.name, body.password);
        issueSession(res, config.jwtSecret, config.secureCookies, user);
        return created(await currentUser(user.id));
      },
    }),
  ];
}
