import { z } from 'zod';
import { profileCopyBody, profileKey, profilePatch } from '../../shared/schemas/profiles';
import { created, defineRoute, noContent } from '../http/route';
import * as profiles from './profiles.service';

const keyParam = z.object({ key: profileKey });

export function profileRoutes() {
  return [
    defineRoute({ method: 'get', path: '/profiles', access: 'viewer', handle: ({ auth }) => profiles.listProfiles(auth.nurseryId) }),
    defineRoute({
      method: 'post', path: '/profiles', access: 'owner', body: profileCopyBody,
      handle: async ({ auth, body }) => created(await profiles.copyProfile(auth.nurseryId, body)),
    }),
    defineRoute({
      method: 'patch', path: '/profiles/:key', access: 'owner', params: keyParam, body: profilePatch,
      handle: ({ auth, params, body }) => profiles.updateProfile(auth.nurseryId, params.key, body),
    }),
    defineRoute({
      method: 'delete', path: '/profiles/:key', access: 'owner', params: keyParam,
      async handle({ auth, params }) {
        await profiles.deleteProfile(auth.nurseryId, params.key);
        return noContent();
      },
    }),
  ];
}
