import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signIn, startTestApp, type TestApp } from '../support/testApp';

type Agent = Awaited<ReturnType<typeof signIn>>;
interface Placement {
  id: number;
  roomId: number;
  from: string;
  to: string | null;
}

const HOUR = 3_600_000;
const iso = (t: number) => new Date(t).toISOString();

describe('graft batches: records, grafting days, filters, moves', () => {
  let t: TestApp;
  let staff: Agent;
  let viewer: Agent;
  let cellar: number;
  let garage: number;
  let shed: number;
  /** Placements in these tests begin here: ten days back, on an hour. */
  const T0 = Math.floor((Date.now() - 10 * 24 * HOUR) / HOUR) * HOUR;
  const graftedOn = new Date(T0 - 24 * HOUR).toISOString().slice(0, 10);

  const apple = (over: Record<string, unknown> = {}) => ({
    species: 'apple', scionCultivar: 'Ashmead Kernel', rootstock: 'M.111', method: 'whip-and-tongue', count: 40,
    graftedOn, roomId: shed, placedAt: iso(T0), ...over,
  });

  beforeAll(async () => {
    t = await startTestApp();
    staff = await signIn(t.app, 'staff@example.com');
    viewer = await signIn(t.app, 'viewer@example.com');
    const rooms = (await staff.get('/api/rooms')).body as { id: number; name: string }[];
    cellar = rooms.find((r) => r.name === 'Root cellar')!.id;
    garage = rooms.find((r) => r.name === 'North garage')!.id;
    shed = (await staff.post('/api/rooms').send({ name: 'Batch test shed', kind: 'other' })).body.id;
  });
  afterAll(() => t.close());

  it('creates a batch placed in a room, reads it back and corrects it', async () => {
    const made = await staff.post('/api/batches').send(apple({ code: '26-TST-001', grafter: 'Tamsin', storageMedium: 'moist sawdust' }));
    expect(made.status).toBe(201);
    expect(made.body).toMatchObject({
      code: '26-TST-001', species: 'apple', scionCultivar: 'Ashmead Kernel', rootstock: 'M.111', method: 'whip-and-tongue', count: 40,
      graftedOn, grafter: 'Tamsin', storageMedium: 'moist sawdust', status: 'in_storage', roomId: shed,
    });
    expect(made.body.placements).toEqual([{ id: expect.any(Number), roomId: shed, from: iso(T0), to: null }]);
    expect((await viewer.get(`/api/batches/${made.body.id}`)).body.code).toBe('26-TST-001');

    const edited = await staff.patch(`/api/batches/${made.body.id}`).send({ count: 38, notes: 'two broke at the union', species: 'pear' });
    expect(edited.status).toBe(200);
    expect(edited.body).toMatchObject({ count: 38, notes: 'two broke at the union', species: 'pear', grafter: 'Tamsin', roomId: shed });
  });

  it('refuses a taken code, an unknown species or room, and bad input', async () => {
    const dup = await staff.post('/api/batches').send(apple({ code: '26-TST-001' }));
    expect(dup.status).toBe(409);
    expect(dup.body.error.code).toBe('code_taken');
    expect((await staff.post('/api/batches').send(apple({ species: 'mango' }))).status).toBe(404);
    expect((await staff.post('/api/batches').send(apple({ roomId: 999_999 }))).status).toBe(404);
    const bad = await staff.post('/api/batches').send(apple({ count: 0, graftedOn: '2026-02-30' }));
    expect(bad.status).toBe(400);
    expect(bad.body.error.code).toBe('validation_failed');
    expect(bad.body.error.message).toMatch(/count/);
    expect(bad.body.error.message).toMatch(/graftedOn/);
  });

  it('refuses a placement before the grafting day or in the future', async () => {
    const early = await staff.post('/api/batches').send(apple({ placedAt: iso(T0 - 3 * 24 * HOUR) }));
    expect(early.status).toBe(400);
    expect(early.body.error.code).toBe('before_grafting');
    const later = await staff.post('/api/batches').send(apple({ placedAt: iso(Date.now() + 3 * HOUR) }));
    expect(later.status).toBe(400);
    expect(later.body.error.code).toBe('in_future');
  });

  it('records a grafting day at once, numbering empty codes per year and species', async () => {
    const day = {
      graftedOn, grafter: 'Wren', roomId: shed, placedAt: iso(T0 + HOUR), method: 'cleft', storageMedium: 'wood shavings',
      rows: [
        { species: 'plum', scionCultivar: 'Greengage', rootstock: 'St Julien A', count: 25 },
        { species: 'plum', scionCultivar: 'Victoria', rootstock: 'Pixy', count: 12, method: 'chip bud' },
        { species: 'walnut', scionCultivar: 'Broadview', rootstock: 'J. regia seedling', count: 8, storageMedium: 'peat', code: 'WAL-A' },
      ],
    };
    // Numbered after the highest plum code of that year already in the nursery (the demo has some).
    const prefix = `${graftedOn.slice(2, 4)}-PLM-`;
    const highest = Math.max(0, ...((await staff.get('/api/batches')).body as { code: string }[])
      .filter((b) => b.code.startsWith(prefix)).map((b) => Number(b.code.slice(prefix.length))));
    const numbered = (n: number) => `${prefix}${String(highest + n).padStart(3, '0')}`;
    const made = await staff.post('/api/batches/bulk').send(day);
    expect(made.status).toBe(201);
    expect(made.body.map((b: { code: string }) => b.code)).toEqual([numbered(1), numbered(2), 'WAL-A']);
    expect(made.body.map((b: { method: string }) => b.method)).toEqual(['cleft', 'chip bud', 'cleft']);
    expect(made.body.map((b: { storageMedium: string }) => b.storageMedium)).toEqual(['wood shavings', 'wood shavings', 'peat']);
    expect(made.body.every((b: { grafter: string; roomId: number; placements: Placement[] }) => b.grafter === 'Wren' && b.roomId === shed && b.placements[0].from === iso(T0 + HOUR))).toBe(true);

    const next = await staff.post('/api/batches').send(apple({ species: 'plum', scionCultivar: 'Czar', rootstock: 'Pixy' }));
    expect(next.body.code).toBe(numbered(3));
  });

  it('rejects a whole grafting day when one row is wrong, storing none of it', async () => {
    const before = (await staff.get('/api/batches').query({ roomId: shed })).body.length;
    const res = await staff.post('/api/batches/bulk').send({
      graftedOn, roomId: shed, placedAt: iso(T0),
      rows: [
        { species: 'apple', scionCultivar: 'Sunset', rootstock: 'M.26', count: 3, method: 'omega' },
        { species: 'apple', scionCultivar: 'Sunset', rootstock: 'M.26', count: 3 },
      ],
    });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/rows\.1\.method/);
    const taken = await staff.post('/api/batches/bulk').send({
      graftedOn, roomId: shed, placedAt: iso(T0), method: 'omega',
      rows: [{ species: 'apple', scionCultivar: 'Sunset', rootstock: 'M.26', count: 3 }, { code: '26-TST-001', species: 'apple', scionCultivar: 'X', rootstock: 'Y', count: 1 }],
    });
    expect(taken.status).toBe(409);
    expect((await staff.get('/api/batches').query({ roomId: shed })).body.length).toBe(before);
  });

  it('filters by species, status, room, cultivar text and grafting days, and sorts', async () => {
    const inShed = (await viewer.get('/api/batches').query({ roomId: shed, sort: 'code', order: 'asc' })).body as { code: string; roomId: number }[];
    expect(inShed.length).toBe(5);
    expect(inShed.map((b) => b.code)).toEqual([...inShed.map((b) => b.code)].sort((a, b) => a.localeCompare(b, 'en', { numeric: true, sensitivity: 'base' })));
    expect(inShed.every((b) => b.roomId === shed)).toBe(true);

    const plums = (await viewer.get('/api/batches').query({ species: 'plum', roomId: shed })).body as { species: string }[];
    expect(plums.length).toBe(3);
    expect(plums.every((b) => b.species === 'plum')).toBe(true);

    const pixy = (await viewer.get('/api/batches').query({ cultivar: 'pix', roomId: shed })).body as { rootstock: string }[];
    expect(pixy.map((b) => b.rootstock)).toEqual(['Pixy', 'Pixy']);
    const gage = (await viewer.get('/api/batches').query({ cultivar: 'GREEN' })).body as { scionCultivar: string }[];
    expect(gage.map((b) => b.scionCultivar)).toEqual(['Greengage']);
    // A % in the text is a character, not a wildcard.
    expect((await viewer.get('/api/batches').query({ cultivar: '%' })).body).toEqual([]);

    const byCount = (await viewer.get('/api/batches').query({ roomId: shed, sort: 'count', order: 'desc' })).body as { count: number }[];
    expect(byCount.map((b) => b.count)).toEqual([...byCount.map((b) => b.count)].sort((a, b) => b - a));

    const dayAfter = new Date(T0 + 24 * HOUR).toISOString().slice(0, 10);
    expect((await viewer.get('/api/batches').query({ roomId: shed, graftedFrom: dayAfter })).body).toEqual([]);
    expect((await viewer.get('/api/batches').query({ roomId: shed, graftedFrom: graftedOn, graftedTo: graftedOn })).body.length).toBe(5);
    expect((await viewer.get('/api/batches').query({ status: 'sold' })).status).toBe(400);
  });

  it('moves a batch: each move closes one placement and opens the next at the same instant, never overlapping', async () => {
    const id = (await staff.post('/api/batches').send(apple({ code: 'MOVE-1' }))).body.id;
    const toGarage = await staff.post(`/api/batches/${id}/move`).send({ roomId: garage, at: iso(T0 + 5 * HOUR) });
    expect(toGarage.status).toBe(200);
    expect(toGarage.body.roomId).toBe(garage);
    // Two moves sent at once with the same time: the lock lets one through; the other finds it no longer follows the last placement.
    const [a, b] = await Promise.all([
      staff.post(`/api/batches/${id}/move`).send({ roomId: cellar, at: iso(T0 + 9 * HOUR) }),
      staff.post(`/api/batches/${id}/move`).send({ roomId: shed, at: iso(T0 + 9 * HOUR) }),
    ]);
    expect([a.status, b.status].sort()).toEqual([200, 409]);
    const backwards = await staff.post(`/api/batches/${id}/move`).send({ roomId: garage, at: iso(T0 + 7 * HOUR) });
    expect(backwards.status).toBe(409);
    expect(backwards.body.error.code).toBe('move_before_last');
    const placements = (await staff.get(`/api/batches/${id}`)).body.placements as Placement[];
    expect(placements.length).toBe(3);
    for (let i = 0; i + 1 < placements.length; i++) expect(placements[i].to).toBe(placements[i + 1].from);
    expect(placements.filter((p) => p.to === null).length).toBe(1);
    const same = await staff.post(`/api/batches/${id}/move`).send({ roomId: placements[2].roomId });
    expect(same.body.error.code).toBe('already_there');
  });

  it('plants out or discards: the open placement closes and the batch leaves storage', async () => {
    const planted = (await staff.post('/api/batches').send(apple({ code: 'OUT-1' }))).body.id;
    const res = await staff.post(`/api/batches/${planted}/plant-out`).send({ at: iso(T0 + 48 * HOUR) });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ status: 'planted_out', leftAt: iso(T0 + 48 * HOUR), roomId: null });
    expect(res.body.placements.at(-1).to).toBe(iso(T0 + 48 * HOUR));
    expect((await staff.post(`/api/batches/${planted}/move`).send({ roomId: garage })).body.error.code).toBe('not_in_storage');
    expect((await staff.post(`/api/batches/${planted}/discard`).send({})).status).toBe(409);

    const dropped = (await staff.post('/api/batches').send(apple({ code: 'OUT-2' }))).body.id;
    const gone = await staff.post(`/api/batches/${dropped}/discard`).send({ note: 'union dried out' });
    expect(gone.body).toMatchObject({ status: 'discarded', leftNote: 'union dried out', roomId: null });
    expect((await viewer.get('/api/batches').query({ status: 'discarded' })).body.map((b: { code: string }) => b.code)).toContain('OUT-2');
  });

  it('keeps batches to their nursery: another nursery gets 404 for every id, read or write', async () => {
    const id = (await staff.post('/api/batches').send(apple({ code: 'MINE-1' }))).body.id;
    const intruder = request.agent(t.app);
    await intruder.post('/api/auth/signup').send({
      nurseryName: 'Hollin Ridge Grafts', name: 'Odo Marsh', email: 'odo@example.org', password: 'a-long-passphrase', timeZone: 'Europe/Berlin',
    });
    const theirRoom = (await intruder.post('/api/rooms').send({ name: 'Their cellar', kind: 'cellar' })).body.id;
    const attempts = [
      intruder.get(`/api/batches/${id}`),
      intruder.patch(`/api/batches/${id}`).send({ notes: 'mine now' }),
      intruder.post(`/api/batches/${id}/move`).send({ roomId: theirRoom }),
      intruder.post(`/api/batches/${id}/discard`).send({}),
      intruder.post(`/api/batches/${id}/plant-out`).send({}),
      intruder.get(`/api/batches/${id}/exposure`),
    ];
    for (const res of await Promise.all(attempts)) {
      expect(res.status).toBe(404);
      expect(res.body.error.code).toBe('not_found');
    }
    expect((await intruder.get('/api/batches')).body).toEqual([]);
    expect((await intruder.get('/api/exposure/batches')).body.rows).toEqual([]);
    // Nor may it put its own batch into our room.
    const sneak = await intruder.post('/api/batches').send({ ...apple(), roomId: shed, placedAt: undefined });
    expect(sneak.status).toBe(404);
    expect((await staff.get(`/api/batches/${id}`)).body.notes).toBe('');
  });

  it('seeds the demo nursery with this season\'s batches, some moved between rooms and one discarded', async () => {
    const demoGrafters = new Set(['Wren Halloway', 'Tamsin Orcutt', 'Jory Pellam']);
    const all = ((await viewer.get('/api/batches').query({ graftedFrom: '2026-11-01', graftedTo: '2026-11-30' })).body as {
      species: string; status: string; grafter: string; placements: Placement[];
    }[]).filter((b) => demoGrafters.has(b.grafter));
    expect(all.length).toBeGreaterThanOrEqual(12);
    expect(new Set(all.map((b) => b.species))).toEqual(new Set(['apple', 'pear', 'plum', 'peach', 'walnut', 'chestnut']));
    expect(all.filter((b) => b.placements.length > 1).length).toBeGreaterThanOrEqual(3);
    expect(all.filter((b) => b.status === 'discarded').length).toBe(1);
    const table = (await viewer.get('/api/exposure/batches')).body.rows as { code: string; headline: { hoursCovered: number } | null }[];
    expect(table.length).toBeGreaterThanOrEqual(11);
    expect(table.every((r) => r.headline !== null)).toBe(true);
  });

  it('lets viewers read but not write', async () => {
    expect((await viewer.post('/api/batches').send(apple())).status).toBe(403);
    expect((await viewer.post('/api/batches/bulk').send({})).status).toBe(403);
  });
});
