import { nurseryPatch } from '../../shared/schemas/nursery';
import { defineRoute } from '../http/route';
import { notFound } from '../http/errors';
import { Nursery } from './nursery.model';

async function findNursery(id: number) {
  const nursery = await Nursery.findByPk(id);
  if (!nursery) throw notFound('That nursery');
  return nursery;
}

const present = (n: Nursery) => ({ id: n.id, name: n.name, timeZone: n.timeZone });

export function nurseryRoutes() {
  return [
    defineRoute({ method: 'get', path: '/nursery', access: 'viewer', handle: async ({ auth }) => present(await findNursery(auth.nurseryId)) }),
    defineRoute({
      method: 'patch', path: '/nursery', access: 'owner', body: nurseryPatch,
      handle: async ({ auth, body }) => present(await (await findNursery(auth.nurseryId)).update(body)),
    }),
  ];
}
