import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { startTestApp, type TestApp } from '../support/testApp';

describe('GET /api/health', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp({ seed: false });
  });
  afterAll(() => t.close());

  it('answers 200 with the database up', async () => {
    const res = await request(t.app).get('/api/health');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ ok: true, db: 'up' });
  });

  it('answers unknown API routes with the one error shape', async () => {
    const res = await request(t.app).get('/api/nothing-here');
    expect(res.status).toBe(404);
    expect(res.body).toEqual({ error: { code: 'no_such_route', message: expect.any(String) } });
  });
});
