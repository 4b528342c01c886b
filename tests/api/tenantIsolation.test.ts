import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signIn, startTestApp, type TestApp } from '../support/testApp';

describe('tenant isolation: one nursery never reaches another\'s records', () => {
  let t: TestApp;
  let intruder: ReturnType<typeof request.agent>;
  let owner: Awaited<ReturnType<typeof signIn>>;
  beforeAll(async () => {
    t = await startTestApp();
    owner = await signIn(t.app, 'owner@example.com');
    intruder = request.agent(t.app);
    const res = await intruder.post('/api/auth/signup').send({
      nurseryName: 'Other Hill Grafts', name: 'Pell Darrow', email: 'pell@example.org', password: 'a-long-passphrase', timeZone: 'Europe/Berlin',
    });
    expect(res.status).toBe(201);
  });
  afterAll(() => t.close());

  it('lists only its own rooms and loggers', async () => {
    expect((await intruder.get('/api/rooms')).body).toEqual([]);
    expect((await intruder.get('/api/loggers')).body).toEqual([]);
    expect((await owner.get('/api/rooms')).body.length).toBeGreaterThanOrEqual(3);
  });

  it('answers 404 for every id of another nursery, read or write', async () => {
    const roomId = (await owner.get('/api/rooms')).body[0].id;
    const loggerId = (await owner.get('/api/loggers')).body[0].id;
    const staffId = (await owner.get('/api/users')).body.find((u: { role: string }) => u.role === 'staff').id;
    const attempts = [
      intruder.get(`/api/rooms/${roomId}`),
      intruder.patch(`/api/rooms/${roomId}`).send({ notes: 'mine now' }),
      intruder.delete(`/api/rooms/${roomId}`),
      intruder.get(`/api/loggers/${loggerId}`),
      intruder.patch(`/api/loggers/${loggerId}`).send({ notes: 'x' }),
      intruder.post(`/api/loggers/${loggerId}/move`).send({ roomId: null }),
      intruder.patch(`/api/users/${staffId}`).send({ role: 'viewer' }),
      intruder.delete(`/api/users/${staffId}`),
    ];
    for (const res of await Promise.all(attempts)) {
      expect(res.status).toBe(404);
      expect(res.body.error.code).toBe('not_found');
    }
    expect((await owner.get(`/api/rooms/${roomId}`)).body.notes).not.toBe('mine now');
  });

  it('cannot place its own logger in another nursery\'s room', async () => {
    const foreignRoom = (await owner.get('/api/rooms')).body[0].id;
    const res = await intruder.post('/api/loggers').send({ label: 'Sneak', roomId: foreignRoom });
    expect(res.status).toBe(404);
  });
});
