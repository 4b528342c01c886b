import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Invitation } from '../../server/users/invitation.model';
import { signIn, startTestApp, TEST_ORIGIN, type TestApp } from '../support/testApp';

describe('sign-in, sessions and invitations', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp({ env: { LOGIN_RATE_LIMIT: '5' } });
  });
  afterAll(() => t.close());

  it('signs in with the demo owner and sets an httpOnly, SameSite=Lax cookie', async () => {
    const res = await request(t.app).post('/api/auth/login').send({ email: 'Owner@Example.com', password: 'coldknit-demo' });
    expect(res.status).toBe(200);
    expect(res.body.user).toMatchObject({ email: 'owner@example.com', role: 'owner' });
    expect(res.body.nursery.name).toBe('Brackenfold Nursery');
    const cookie = String(res.headers['set-cookie']);
    expect(cookie).toMatch(/ck_session=/);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    expect(JSON.stringify(res.body)).not.toMatch(/passwordHash|password_hash/);
  });

  it('refuses a wrong password with 401 and the error shape', async () => {
    const res = await request(t.app).post('/api/auth/login').send({ email: 'owner@example.com', password: 'nope' });
    expect(res.status).toBe(401);
    expect(res.body).toEqual({ error: { code: 'bad_credentials', message: expect.any(String) } });
  });

  it('validates bodies with zod and says what is wrong', async () => {
    const res = await request(t.app).post('/api/auth/login').send({ email: 'not-an-email' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation_failed');
    expect(res.body.error.message).toMatch(/email/);
    const bad = await request(t.app).post('/api/auth/login').set('content-type', 'application/json').send('{"email":');
    expect(bad.status).toBe(400);
    expect(bad.body.error.code).toBe('invalid_json');
  });

  it('rate-limits repeated sign-in attempts for one address', async () => {
    const statuses: number[] = [];
    for (let i = 0; i < 7; i++) {
      statuses.push((await request(t.app).post('/api/auth/login').send({ email: 'victim@example.com', password: 'guess' })).status);
    }
    expect(statuses.slice(0, 5).every((s) => s === 401)).toBe(true);
    expect(statuses.at(-1)).toBe(429);
  });

  it('signs out: the cookie is cleared and /me answers 401', async () => {
    const agent = await signIn(t.app, 'staff@example.com');
    expect((await agent.get('/api/auth/me')).status).toBe(200);
    expect((await agent.post('/api/auth/logout')).status).toBe(204);
    expect((await agent.get('/api/auth/me')).status).toBe(401);
  });

  it('a password change ends every other session', async () => {
    const phone = await signIn(t.app, 'viewer@example.com');
    const desk = await signIn(t.app, 'viewer@example.com');
    const res = await desk.post('/api/auth/password').send({ currentPassword: 'coldknit-demo', newPassword: 'a-new-long-passphrase' });
    expect(res.status).toBe(204);
    expect((await desk.get('/api/auth/me')).status).toBe(200);
    expect((await phone.get('/api/auth/me')).status).toBe(401);
    await desk.post('/api/auth/password').send({ currentPassword: 'a-new-long-passphrase', newPassword: 'coldknit-demo' });
  });

  it('invites by e-mail; the link sets a password once and signs the invitee in', async () => {
    const owner = await signIn(t.app, 'owner@example.com');
    const sent = await owner.post('/api/invitations').send({ email: 'new.hand@example.com', role: 'staff' });
    expect(sent.status).toBe(201);
    const mail = t.mail.messages.find((m) => m.to.includes('new.hand@example.com'))!;
    expect(mail.subject).toMatch(/Brackenfold Nursery/);
    expect(mail.html).toMatch(/<a href=/);
    const link = new RegExp(`${TEST_ORIGIN}/invite/([A-Za-z0-9_-]+)`).exec(mail.text)!;
    const token = link[1];

    const about = await request(t.app).get(`/api/invitations/token/${token}`);
    expect(about.body).toEqual({ email: 'new.hand@example.com', role: 'staff', nurseryName: 'Brackenfold Nursery' });

    const invitee = request.agent(t.app);
    const accepted = await invitee.post(`/api/invitations/token/${token}/accept`).send({ name: 'New Hand', password: 'fresh-passphrase' });
    expect(accepted.status).toBe(201);
    expect(accepted.body.user).toMatchObject({ email: 'new.hand@example.com', role: 'staff' });
    expect((await invitee.get('/api/auth/me')).status).toBe(200);

    const again = await request(t.app).post(`/api/invitations/token/${token}/accept`).send({ name: 'Thief', password: 'fresh-passphrase' });
    expect(again.status).toBe(410);
  });

  it('an invitation expires after 72 hours', async () => {
    const owner = await signIn(t.app, 'owner@example.com');
    await owner.post('/api/invitations').send({ email: 'late@example.com', role: 'viewer' });
    const token = /\/invite\/([A-Za-z0-9_-]+)/.exec(t.mail.messages.find((m) => m.to.includes('late@example.com'))!.text)![1];
    const invitation = await Invitation.findOne({ where: { email: 'late@example.com' } });
    expect(invitation!.expiresAt.getTime() - invitation!.createdAt.getTime()).toBeCloseTo(72 * 3600 * 1000, -4);
    await invitation!.update({ expiresAt: new Date(Date.now() - 1000) });
    expect((await request(t.app).get(`/api/invitations/token/${token}`)).status).toBe(410);
  });

  it('keeps at least one owner', async () => {
    const owner = await signIn(t.app, 'owner@example.com');
    const me = (await owner.get('/api/auth/me')).body.user;
    const res = await owner.patch(`/api/users/${me.id}`).send({ role: 'staff' });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('last_owner');
  });

  it('API tokens are shown once, stored hashed, read and never write outside imports, and can be revoked', async () => {
    const owner = await signIn(t.app, 'owner@example.com');
    const made = await owner.post('/api/tokens').send({ name: 'barn laptop cron' });
    expect(made.body.token).toMatch(/^ckt_/);
    const listed = (await owner.get('/api/tokens')).body;
    expect(JSON.stringify(listed)).not.toContain(made.body.token);
    const bearer = { authorization: `Bearer ${made.body.token}` };
    expect((await request(t.app).get('/api/rooms').set(bearer)).status).toBe(200);
    expect((await request(t.app).post('/api/rooms').set(bearer).send({ name: 'By token', kind: 'other' })).status).toBe(403);
    expect((await request(t.app).get('/api/users').set(bearer)).status).toBe(403);
    await owner.post(`/api/tokens/${made.body.id}/revoke`);
    expect((await request(t.app).get('/api/rooms').set(bearer)).status).toBe(401);
  });
});

describe('same-origin guard for state-changing requests', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp();
  });
  afterAll(() => t.close());

  it('refuses cross-site and foreign-origin writes, allows same-origin and header-less (CLI) ones', async () => {
    const owner = await signIn(t.app, 'owner@example.com');
    const body = { name: 'Guarded', kind: 'other' };
    expect((await owner.post('/api/rooms').set('Sec-Fetch-Site', 'cross-site').send(body)).status).toBe(403);
    expect((await owner.post('/api/rooms').set('Origin', 'https://evil.example').send(body)).status).toBe(403);
    expect((await owner.post('/api/rooms').set('Origin', TEST_ORIGIN).set('Sec-Fetch-Site', 'same-origin').send(body)).status).toBe(201);
    expect((await owner.post('/api/rooms').send({ ...body, name: 'Guarded 2' })).status).toBe(201);
    expect((await owner.get('/api/rooms').set('Sec-Fetch-Site', 'cross-site')).status).toBe(200);
  });

  it('acceptance: viewer gets 403 on POST /api/rooms, owner 201', async () => {
    const viewer = await signIn(t.app, 'viewer@example.com');
    const owner = await signIn(t.app, 'owner@example.com');
    expect((await viewer.post('/api/rooms').send({ name: 'Nope', kind: 'other' })).status).toBe(403);
    expect((await owner.post('/api/rooms').send({ name: 'Yes', kind: 'garage' })).status).toBe(201);
  });

  it('sends security headers', async () => {
    const res = await request(t.app).get('/api/health');
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['content-security-policy']).toMatch(/default-src 'self'/);
  });
});
