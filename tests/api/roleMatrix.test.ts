import request from 'supertest';
import type TestAgent from 'supertest/lib/agent';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ROLE_RANK, type Role } from '../../shared/schemas/common';
import { Alert } from '../../server/alerts/alert.model';
import { User } from '../../server/users/user.model';
import { signIn, startTestApp, type TestApp } from '../support/testApp';

type Who = 'anonymous' | Role;
type Agent = TestAgent | ReturnType<typeof request.agent>;

/**
 * For each route: how to make a valid request (fresh targets for destructive ones) and the status it earns
 * when the role may use it. Roles below the route's access get 403; anonymous callers 401 unless it is public.
 */
interface Case {
  prepare(owner: Agent): Promise<{ path: string; body?: unknown; file?: { name: string; content: string } }>;
  ok: number;
}

/** A small, valid logger file for the upload route; the dry run keeps the matrix from storing readings. */
const SMALL_FILE = { name: 'matrix.csv', content: 'time,temperature °C\n2026-11-20T06:00:00Z,3.5\n2026-11-20T06:10:00Z,3.4\n' };

let seq = 0;
const unique = (prefix: string) => `${prefix}-${Date.now()}-${++seq}`;
const firstId = async (owner: Agent, path: string) => (await owner.get(path)).body[0].id as number;
const newRoom = async (owner: Agent) => (await owner.post('/api/rooms').send({ name: unique('room'), kind: 'other' })).body.id as number;
const batchBody = async (owner: Agent) => ({
  species: 'apple', scionCultivar: 'Matrix', rootstock: 'M.111', method: 'cleft', count: 5, roomId: await newRoom(owner),
  graftedOn: new Date(Date.now() - 86_400_000).toISOString().slice(0, 10), placedAt: new Date(Date.now() - 3_600_000).toISOString(),
});
const newBatch = async (owner: Agent) => (await owner.post('/api/batches').send(await batchBody(owner))).body.id as number;
const daysAgo = (days: number) => new Date(Date.now() - days * 86_400_000).toISOString().slice(0, 10);
/** A fresh batch with all its grafts planted two days ago (dates in UTC: the demo nursery's Chicago is behind, so they are never ahead of its calendar). */
const newPlanting = async (owner: Agent) => {
  const batchId = (await owner.post('/api/batches').send({ ...(await batchBody(owner)), graftedOn: daysAgo(4), placedAt: new Date(Date.now() - 3 * 86_400_000).toISOString() })).body.id as number;
  const plantingId = (await owner.post(`/api/batches/${batchId}/plantings`).send({ plantedOn: daysAgo(2), count: 5, location: 'Matrix bed' })).body.id as number;
  return { batchId, plantingId };
};
const newAssessment = async (owner: Agent) =>
  (await owner.post(`/api/batches/${(await newPlanting(owner)).batchId}/assessments`).send({ assessedOn: daysAgo(1), grown: 4 })).body.id as number;
const newProfile = async (owner: Agent) => (await owner.post('/api/profiles').send({ from: 'pear', key: unique('p'), name: 'Matrix pear' })).body.key as string;

const CASES: Record<string, Case> = {
  'GET /api/health': { prepare: async () => ({ path: '/api/health' }), ok: 200 },
  'GET /api/meta': { prepare: async () => ({ path: '/api/meta' }), ok: 200 },
  'GET /api/dev/mail': { prepare: async () => ({ path: '/api/dev/mail' }), ok: 404 }, // no dev inbox in tests
  'POST /api/auth/login': { prepare: async () => ({ path: '/api/auth/login', body: { email: 'viewer@example.com', password: 'coldknit-demo' } }), ok: 200 },
  'POST /api/auth/logout': { prepare: async () => ({ path: '/api/auth/logout' }), ok: 204 },
  'GET /api/auth/me': { prepare: async () => ({ path: '/api/auth/me' }), ok: 200 },
  'POST /api/auth/signup': {
    prepare: async () => ({ path: '/api/auth/signup', body: { nurseryName: 'Matrix Test', name: 'M', email: `${unique('m')}@example.com`, password: 'long-enough-pass', timeZone: 'Europe/Berlin' } }),
    ok: 201,
  },
  'POST /api/auth/password': { prepare: async () => ({ path: '/api/auth/password', body: { currentPassword: 'wrong-password', newPassword: 'another-long-pass' } }), ok: 400 },
  'PATCH /api/auth/preferences': { prepare: async () => ({ path: '/api/auth/preferences', body: { unit: 'F' } }), ok: 200 },
  'GET /api/users': { prepare: async () => ({ path: '/api/users' }), ok: 200 },
  'PATCH /api/users/:id': { prepare: async (o) => ({ path: `/api/users/${await userId(o, 'staff@example.com')}`, body: { role: 'staff' } }), ok: 200 },
  'DELETE /api/users/:id': { prepare: async (o) => ({ path: `/api/users/${await invitedUser(o)}` }), ok: 204 },
  'GET /api/invitations': { prepare: async () => ({ path: '/api/invitations' }), ok: 200 },
  'POST /api/invitations': { prepare: async () => ({ path: '/api/invitations', body: { email: `${unique('inv')}@example.com`, role: 'viewer' } }), ok: 201 },
  'DELETE /api/invitations/:id': {
    prepare: async (o) => ({ path: `/api/invitations/${(await o.post('/api/invitations').send({ email: `${unique('c')}@example.com`, role: 'viewer' })).body.id}` }),
    ok: 204,
  },
  'GET /api/invitations/token/:token': { prepare: async () => ({ path: `/api/invitations/token/${'a'.repeat(43)}` }), ok: 410 },
  'POST /api/invitations/token/:token/accept': {
    prepare: async () => ({ path: `/api/invitations/token/${'a'.repeat(43)}/accept`, body: { name: 'X', password: 'long-enough-pass' } }),
    ok: 410,
  },
  'GET /api/nursery': { prepare: async () => ({ path: '/api/nursery' }), ok: 200 },
  'PATCH /api/nursery': { prepare: async () => ({ path: '/api/nursery', body: { timeZone: 'America/Chicago' } }), ok: 200 },
  'GET /api/tokens': { prepare: async () => ({ path: '/api/tokens' }), ok: 200 },
  'POST /api/tokens': { prepare: async () => ({ path: '/api/tokens', body: { name: unique('token') } }), ok: 201 },
  'POST /api/tokens/:id/revoke': {
    prepare: async (o) => ({ path: `/api/tokens/${(await o.post('/api/tokens').send({ name: unique('t') })).body.id}/revoke` }),
    ok: 200,
  },
  'GET /api/rooms': { prepare: async () => ({ path: '/api/rooms' }), ok: 200 },
  'GET /api/rooms/:id': { prepare: async (o) => ({ path: `/api/rooms/${await firstId(o, '/api/rooms')}` }), ok: 200 },
  'POST /api/rooms': { prepare: async () => ({ path: '/api/rooms', body: { name: unique('room'), kind: 'cellar' } }), ok: 201 },
  'PATCH /api/rooms/:id': { prepare: async (o) => ({ path: `/api/rooms/${await firstId(o, '/api/rooms')}`, body: { notes: 'checked' } }), ok: 200 },
  'DELETE /api/rooms/:id': { prepare: async (o) => ({ path: `/api/rooms/${await newRoom(o)}` }), ok: 204 },
  'GET /api/loggers': { prepare: async () => ({ path: '/api/loggers' }), ok: 200 },
  'GET /api/loggers/:id': { prepare: async (o) => ({ path: `/api/loggers/${await firstId(o, '/api/loggers')}` }), ok: 200 },
  'POST /api/loggers': { prepare: async () => ({ path: '/api/loggers', body: { label: unique('L') } }), ok: 201 },
  'PATCH /api/loggers/:id': { prepare: async (o) => ({ path: `/api/loggers/${await firstId(o, '/api/loggers')}`, body: { notes: 'moved shelf' } }), ok: 200 },
  'GET /api/imports': { prepare: async () => ({ path: '/api/imports' }), ok: 200 },
  'GET /api/imports/:id': { prepare: async (o) => ({ path: `/api/imports/${await firstId(o, '/api/imports')}` }), ok: 200 },
  'POST /api/imports': { prepare: async () => ({ path: '/api/imports', body: { logger: 'K-01', dryRun: 'true' }, file: SMALL_FILE }), ok: 200 },
  'POST /api/loggers/:id/move': {
    prepare: async (o) => {
      const logger = (await o.post('/api/loggers').send({ label: unique('M') })).body.id;
      return { path: `/api/loggers/${logger}/move`, body: { roomId: await newRoom(o) } };
    },
    ok: 200,
  },
  'GET /api/profiles': { prepare: async () => ({ path: '/api/profiles' }), ok: 200 },
  'POST /api/profiles': { prepare: async () => ({ path: '/api/profiles', body: { from: 'apple', key: unique('copy'), name: 'Matrix apple' } }), ok: 201 },
  'PATCH /api/profiles/:key': { prepare: async (o) => ({ path: `/api/profiles/${await newProfile(o)}`, body: { freezeC: -3 } }), ok: 200 },
  'DELETE /api/profiles/:key': { prepare: async (o) => ({ path: `/api/profiles/${await newProfile(o)}` }), ok: 204 },
  'GET /api/batches': { prepare: async () => ({ path: '/api/batches' }), ok: 200 },
  'GET /api/batches/:id': { prepare: async (o) => ({ path: `/api/batches/${await newBatch(o)}` }), ok: 200 },
  'POST /api/batches': { prepare: async (o) => ({ path: '/api/batches', body: await batchBody(o) }), ok: 201 },
  'POST /api/batches/bulk': {
    prepare: async (o) => {
      const { roomId, graftedOn, ...row } = await batchBody(o);
      return { path: '/api/batches/bulk', body: { roomId, graftedOn, rows: [row, row] } };
    },
    ok: 201,
  },
  'PATCH /api/batches/:id': { prepare: async (o) => ({ path: `/api/batches/${await newBatch(o)}`, body: { notes: 'heeled in' } }), ok: 200 },
  'POST /api/batches/:id/move': { prepare: async (o) => ({ path: `/api/batches/${await newBatch(o)}/move`, body: { roomId: await newRoom(o) } }), ok: 200 },
  'POST /api/batches/:id/discard': { prepare: async (o) => ({ path: `/api/batches/${await newBatch(o)}/discard`, body: {} }), ok: 200 },
  'POST /api/batches/:id/plant-out': { prepare: async (o) => ({ path: `/api/batches/${await newBatch(o)}/plant-out`, body: {} }), ok: 200 },
  'GET /api/batches/:id/exposure': { prepare: async (o) => ({ path: `/api/batches/${await newBatch(o)}/exposure` }), ok: 200 },
  'GET /api/exposure/batches': { prepare: async () => ({ path: '/api/exposure/batches' }), ok: 200 },
  'GET /api/rooms/:id/series': {
    prepare: async (o) => ({ path: `/api/rooms/${await firstId(o, '/api/rooms')}/series?from=2026-11-02T00:00:00Z&to=2026-11-09T00:00:00Z&width=300` }),
    ok: 200,
  },
  'GET /api/rooms/:id/daily': {
    prepare: async (o) => ({ path: `/api/rooms/${await firstId(o, '/api/rooms')}/daily?from=2026-11-02T00:00:00Z&to=2026-11-09T00:00:00Z` }),
    ok: 200,
  },
  'GET /api/overview': { prepare: async () => ({ path: '/api/overview' }), ok: 200 },
  'GET /api/batches/:id/outcome': { prepare: async (o) => ({ path: `/api/batches/${(await newPlanting(o)).batchId}/outcome` }), ok: 200 },
  'POST /api/batches/:id/plantings': {
    prepare: async (o) => ({ path: `/api/batches/${await newBatch(o)}/plantings`, body: { plantedOn: daysAgo(1), count: 2, location: 'Matrix bed' } }),
    ok: 201,
  },
  'PATCH /api/plantings/:id': { prepare: async (o) => ({ path: `/api/plantings/${(await newPlanting(o)).plantingId}`, body: { location: 'Bed 2' } }), ok: 200 },
  'DELETE /api/plantings/:id': { prepare: async (o) => ({ path: `/api/plantings/${(await newPlanting(o)).plantingId}` }), ok: 204 },
  'POST /api/batches/:id/assessments': {
    prepare: async (o) => ({ path: `/api/batches/${(await newPlanting(o)).batchId}/assessments`, body: { assessedOn: daysAgo(1), grown: 3 } }),
    ok: 201,
  },
  'PATCH /api/assessments/:id': { prepare: async (o) => ({ path: `/api/assessments/${await newAssessment(o)}`, body: { grown: 5 } }), ok: 200 },
  'DELETE /api/assessments/:id': { prepare: async (o) => ({ path: `/api/assessments/${await newAssessment(o)}` }), ok: 204 },
  'GET /api/seasons': { prepare: async () => ({ path: '/api/seasons' }), ok: 200 },
  'GET /api/seasons/:season/report': { prepare: async () => ({ path: '/api/seasons/2026/report' }), ok: 200 },
  'GET /api/seasons/:season/export': { prepare: async () => ({ path: '/api/seasons/2026/export' }), ok: 200 },
  'GET /api/alerts': { prepare: async () => ({ path: '/api/alerts?status=open' }), ok: 200 },
  'GET /api/alerts/summary': { prepare: async () => ({ path: '/api/alerts/summary' }), ok: 200 },
  'GET /api/alerts/:id': { prepare: async () => ({ path: `/api/alerts/${await openAlert()}` }), ok: 200 },
  'POST /api/alerts/:id/acknowledge': { prepare: async () => ({ path: `/api/alerts/${await openAlert()}/acknowledge` }), ok: 200 },
  'GET /api/alert-settings': { prepare: async () => ({ path: '/api/alert-settings' }), ok: 200 },
  'PATCH /api/alert-settings': { prepare: async () => ({ path: '/api/alert-settings', body: { set: { holdMinutes: 15 } } }), ok: 200 },
  'PATCH /api/alert-settings/rooms/:id': {
    prepare: async (o) => ({ path: `/api/alert-settings/rooms/${await firstId(o, '/api/rooms')}`, body: { set: { silentHours: 30 } } }),
    ok: 200,
  },
  'DELETE /api/alert-settings/rooms/:id': { prepare: async (o) => ({ path: `/api/alert-settings/rooms/${await firstId(o, '/api/rooms')}` }), ok: 204 },
  'GET /api/alert-subscriptions': { prepare: async () => ({ path: '/api/alert-subscriptions' }), ok: 200 },
  'PATCH /api/alert-subscriptions': { prepare: async () => ({ path: '/api/alert-subscriptions', body: { daily_digest: 'off' } }), ok: 200 },
};

const SESSION_CHANGING = new Set(['/api/auth/login', '/api/auth/logout', '/api/auth/signup']);

let t: TestApp;
async function userId(owner: Agent, email: string) {
  const users = (await owner.get('/api/users')).body as { id: number; email: string }[];
  return users.find((u) => u.email === email)!.id;
}
/** A throw-away staff member, made the way users are really made: invited, then accepted through the mailed link. */
async function invitedUser(owner: Agent) {
  const email = `${unique('gone')}@example.com`;
  await owner.post('/api/invitations').send({ email, role: 'staff' });
  const mail = t.mail.messages.find((m) => m.to.includes(email))!;
  const token = /\/invite\/([A-Za-z0-9_-]+)/.exec(mail.text)![1];
  await request(t.app).post(`/api/invitations/token/${token}/accept`).send({ name: 'Temp', password: 'long-enough-pass' });
  return userId(owner, email);
}

/** An open alert in the demo nursery. No route opens one (the evaluator does), so it is written directly. */
async function openAlert() {
  const { nurseryId } = (await User.findOne({ where: { email: 'owner@example.com' } }))!;
  const now = new Date();
  const alert = await Alert.create({
    nurseryId, rule: 'silent_logger', subjectKind: 'logger', subjectId: ++seq, subjectName: 'Matrix logger', roomId: null,
    severity: 'warning', status: 'open', since: now, openedAt: now, detail: {}, checkedAt: now,
  });
  return alert.id;
}

describe('role matrix: every route × every role', () => {
  const agents = {} as Record<Who, Agent>;
  beforeAll(async () => {
    t = await startTestApp();
    agents.anonymous = request.agent(t.app);
    agents.owner = await signIn(t.app, 'owner@example.com');
    agents.staff = await signIn(t.app, 'staff@example.com');
    agents.viewer = await signIn(t.app, 'viewer@example.com');
  });
  afterAll(() => t.close());

  it('has an expectation for every route the app serves, and no stale ones', () => {
    const served = t.routes.map((r) => `${r.method} ${r.path}`).sort();
    expect(Object.keys(CASES).sort()).toEqual(served);
  });

  for (const who of ['anonymous', 'viewer', 'staff', 'owner'] as Who[]) {
    it(`answers ${who} with the expected status on each route`, async () => {
      const results: string[] = [];
      const expected: string[] = [];
      for (const route of t.routes) {
        const key = `${route.method} ${route.path}`;
        const c = CASES[key];
        const { path, body, file } = await c.prepare(agents.owner);
        const status =
          route.access === 'public' ? c.ok
          : who === 'anonymous' ? 401
          : route.access === 'signedIn' || ROLE_RANK[who] >= ROLE_RANK[route.access] ? c.ok
          : 403;
        // Routes that set or clear the session cookie get a fresh agent, so the role under test keeps its own session.
        const agent = SESSION_CHANGING.has(route.path) ? request.agent(t.app) : agents[who];
        const call = agent[route.method.toLowerCase() as 'get'](path);
        const res = file
          ? await Object.entries(body as Record<string, string>).reduce((r, [k, v]) => r.field(k, v), call).attach('file', Buffer.from(file.content), file.name)
          : await call.send(body as object);
        results.push(`${key} → ${res.status}`);
        expected.push(`${key} → ${status}`);
      }
      expect(results).toEqual(expected);
    });
  }
});
