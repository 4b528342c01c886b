import { idParam } from '../../shared/schemas/common';
import { roomBody, roomPatch } from '../../shared/schemas/rooms';
import { created, defineRoute, noContent } from '../http/route';
import * as rooms from './rooms.service';

export function roomRoutes() {
  return [
    defineRoute({ method: 'get', path: '/rooms', access: 'viewer', handle: ({ auth }) => rooms.listRooms(auth.nurseryId) }),
    defineRoute({
      method: 'get', path: '/rooms/:id', access: 'viewer', params: idParam,
      handle: async ({ auth, params }) => (await rooms.findRoom(auth.nurseryId, params.id)).toPublic(),
    }),
    defineRoute({
      method: 'post', path: '/rooms', access: 'staff', body: roomBody,
      handle: async ({ auth, body }) => created(await rooms.createRoom(auth.nurseryId, body)),
    }),
    defineRoute({
      method: 'patch', path: '/rooms/:id', access: 'staff', params: idParam, body: roomPatch,
      handle: ({ auth, params, body }) => rooms.updateRoom(auth.nurseryId, params.id, body),
    }),
    defineRoute({
      method: 'delete', path: '/rooms/:id', access: 'staff', params: idParam,
      async handle({ auth, params }) {
        await rooms.deleteRoom(auth.nurseryId, params.id);
        return noContent();
      },
    }),
  ];
}
