import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { SPECIES_PROFILES } from '../../shared/species/profiles';
import { signIn, startTestApp, type TestApp } from '../support/testApp';

type Agent = Awaited<ReturnType<typeof signIn>>;
interface Listed {
  key: string;
  name: string;
  origin: 'built-in' | 'nursery';
  basedOn: string | null;
  freezeC: number;
  band: { minC: number; maxC: number };
  callus: { hoursAtOptimum: number };
  sources: Record<string, string>;
  batchCount: number;
}

describe('species profiles: built-in ones read-only, the nursery\'s own copies editable by the owner', () => {
  let t: TestApp;
  let owner: Agent;
  let staff: Agent;
  const list = async () => (await owner.get('/api/profiles')).body as Listed[];

  beforeAll(async () => {
    t = await startTestApp();
    owner = await signIn(t.app, 'owner@example.com');
    staff = await signIn(t.app, 'staff@example.com');
  });
  afterAll(() => t.close());

  it('lists every built-in profile, saying it is built in', async () => {
    const profiles = await list();
    const builtIn = profiles.filter((p) => p.origin === 'built-in');
    expect(builtIn.map((p) => p.key)).toEqual(SPECIES_PROFILES.map((p) => p.key));
    expect(builtIn.every((p) => p.basedOn === null)).toBe(true);
    expect(profiles.find((p) => p.key === 'apple')!.batchCount).toBeGreaterThan(0);
  });

  it('copies a built-in profile, and a copy of the copy still names the built-in it descends from', async () => {
    const copy = await owner.post('/api/profiles').send({ from: 'pear', key: 'pear-cellar', name: 'Pear in the cellar' });
    expect(copy.status).toBe(201);
    expect(copy.body).toMatchObject({ key: 'pear-cellar', name: 'Pear in the cellar', origin: 'nursery', basedOn: 'pear', batchCount: 0 });
    const pear = SPECIES_PROFILES.find((p) => p.key === 'pear')!;
    expect(copy.body).toMatchObject({ freezeC: pear.freezeC, band: pear.band, callus: pear.callus, sources: pear.sources });
    const second = await owner.post('/api/profiles').send({ from: 'pear-cellar', key: 'pear-garage', name: 'Pear in the garage' });
    expect(second.body.basedOn).toBe('pear');
    expect((await list()).filter((p) => p.origin === 'nursery').map((p) => p.key).sort()).toEqual(['pear-cellar', 'pear-garage']);
  });

  it('refuses a key that is taken, built in or copied, and a source that does not exist', async () => {
    for (const key of ['apple', 'pear-cellar']) {
      const res = await owner.post('/api/profiles').send({ from: 'pear', key, name: 'Again' });
      expect(res.status).toBe(409);
      expect(res.body.error.code).toBe('profile_key_taken');
    }
    expect((await owner.post('/api/profiles').send({ from: 'mango', key: 'mango-2', name: 'M' })).status).toBe(404);
    expect((await owner.post('/api/profiles').send({ from: 'pear', key: 'Bad Key', name: 'M' })).status).toBe(400);
  });

  it('edits numbers, marking a changed number whose source was not given as the nursery\'s own', async () => {
    const res = await owner.patch('/api/profiles/pear-cellar').send({
      band: { maxC: 8 }, freezeC: -3, sources: { freezeC: 'Our own three seasons of cellar records.' },
    });
    expect(res.status).toBe(200);
    expect(res.body.band.maxC).toBe(8);
    expect(res.body.freezeC).toBe(-3);
    expect(res.body.sources.freezeC).toBe('Our own three seasons of cellar records.');
    expect(res.body.sources['band.maxC']).toMatch(/^\[NURSERY\] This nursery's own value, set on \d{4}-\d{2}-\d{2} \(was 7\.22/);
    // Untouched numbers keep their citations.
    expect(res.body.sources['band.minC']).toBe(SPECIES_PROFILES.find((p) => p.key === 'pear')!.sources['band.minC']);
  });

  it('validates the whole edited profile with the shared schema', async () => {
    const inverted = await owner.patch('/api/profiles/pear-cellar').send({ band: { minC: 9 } });
    expect(inverted.status).toBe(400);
    expect(inverted.body.error.message).toMatch(/band/);
    const freezeInBand = await owner.patch('/api/profiles/pear-cellar').send({ freezeC: 1 });
    expect(freezeInBand.status).toBe(400);
    expect(freezeInBand.body.error.message).toMatch(/freeze/);
    expect((await owner.patch('/api/profiles/pear-cellar').send({ callus: { hoursAtOptimum: 0 } })).status).toBe(400);
    expect((await list()).find((p) => p.key === 'pear-cellar')!.band).toEqual({ minC: 0, maxC: 8 });
  });

  it('keeps built-in profiles as they are', async () => {
    const patch = await owner.patch('/api/profiles/apple').send({ freezeC: -5 });
    expect(patch.status).toBe(409);
    expect(patch.body.error.code).toBe('built_in_profile');
    expect((await owner.delete('/api/profiles/apple')).status).toBe(409);
    expect((await owner.patch('/api/profiles/not-there').send({ freezeC: -5 })).status).toBe(404);
  });

  it('deletes an unused copy, but not one batches use', async () => {
    const roomId = (await staff.get('/api/rooms')).body[0].id;
    const batch = await staff.post('/api/batches').send({
      species: 'pear-garage', scionCultivar: 'Profile Test', rootstock: 'quince seedling', method: 'cleft', count: 3, roomId,
      graftedOn: new Date(Date.now() - 86_400_000).toISOString().slice(0, 10),
    });
    expect(batch.status).toBe(201);
    const inUse = await owner.delete('/api/profiles/pear-garage');
    expect(inUse.status).toBe(409);
    expect(inUse.body.error.code).toBe('profile_in_use');
    expect((await owner.delete('/api/profiles/pear-cellar')).status).toBe(204);
    expect((await list()).map((p) => p.key)).not.toContain('pear-cellar');
  });

  it('lets only the owner change profiles', async () => {
    expect((await staff.post('/api/profiles').send({ from: 'apple', key: 'staff-copy', name: 'S' })).status).toBe(403);
    expect((await staff.patch('/api/profiles/pear-garage').send({ freezeC: -4 })).status).toBe(403);
    expect((await staff.get('/api/profiles')).status).toBe(200);
  });
});
