import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signIn, startTestApp, type TestApp } from '../support/testApp';

describe('rooms and loggers with placement history', () => {
  let t: TestApp;
  let staff: Awaited<ReturnType<typeof signIn>>;
  beforeAll(async () => {
    t = await startTestApp();
    staff = await signIn(t.app, 'staff@example.com');
  });
  afterAll(() => t.close());

  it('creates, edits and refuses a duplicate room name', async () => {
    const made = await staff.post('/api/rooms').send({ name: 'Potting shed', kind: 'other', notes: 'north side' });
    expect(made.status).toBe(201);
    expect((await staff.patch(`/api/rooms/${made.body.id}`).send({ kind: 'garage' })).body.kind).toBe('garage');
    const dup = await staff.post('/api/rooms').send({ name: 'Potting shed', kind: 'other' });
    expect(dup.status).toBe(409);
    expect((await staff.post('/api/rooms').send({ name: 'X', kind: 'attic' })).status).toBe(400);
  });

  it('moving a logger closes one placement and opens the next, never overlapping', async () => {
    const rooms = (await staff.get('/api/rooms')).body as { id: number; name: string }[];
    const cellar = rooms.find((r) => r.name === 'Root cellar')!.id;
    const garage = rooms.find((r) => r.name === 'North garage')!.id;
    const made = await staff.post('/api/loggers').send({ label: 'T-9', serial: 'X1', roomId: cellar });
    expect(made.body.roomId).toBe(cellar);
    const at = new Date(Date.now() + 60_000).toISOString();
    const moved = await staff.post(`/api/loggers/${made.body.id}/move`).send({ roomId: garage, at });
    expect(moved.status).toBe(200);
    expect(moved.body.roomId).toBe(garage);
    const [first, second] = moved.body.placements;
    expect(first.to).toBe(at);
    expect(second).toMatchObject({ roomId: garage, from: at, to: null });

    const backwards = await staff.post(`/api/loggers/${made.body.id}/move`).send({ roomId: cellar, at: new Date(Date.now() - 3600_000).toISOString() });
    expect(backwards.status).toBe(409);
    expect(backwards.body.error.code).toBe('move_before_last');

    const out = await staff.post(`/api/loggers/${made.body.id}/move`).send({ roomId: null, at: new Date(Date.now() + 120_000).toISOString() });
    expect(out.body.roomId).toBeNull();
    expect(out.body.placements.every((p: { to: string | null }) => p.to !== null)).toBe(true);
  });

  it('refuses a move dated in the future', async () => {
    const made = await staff.post('/api/loggers').send({ label: 'T-10' });
    const res = await staff.post(`/api/loggers/${made.body.id}/move`).send({ roomId: null, at: new Date(Date.now() + 3600_000).toISOString() });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('move_in_future');
  });

  it('keeps a room that only ever held a batch', async () => {
    const room = (await staff.post('/api/rooms').send({ name: 'Spare shed', kind: 'other' })).body.id;
    const batch = await staff.post('/api/batches').send({
      species: 'apple', scionCultivar: 'Test Pippin', rootstock: 'M.111', method: 'cleft', count: 5,
      graftedOn: '2026-11-20', roomId: room, placedAt: '2026-11-20T12:00:00Z',
    });
    expect(batch.status).toBe(201);
    const res = await staff.delete(`/api/rooms/${room}`);
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('room_in_use');
  });

  it('keeps a room with history', async () => {
    const cellar = (await staff.get('/api/rooms')).body.find((r: { name: string }) => r.name === 'Root cellar').id;
    const res = await staff.delete(`/api/rooms/${cellar}`);
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('room_in_use');
  });
});
