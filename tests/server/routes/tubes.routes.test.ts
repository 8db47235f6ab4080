import { describe, expect, it } from 'vitest';
import { tubes } from '../../../server/db/schema';
import { useTestApp } from '../../support/test-app';

const ctx = useTestApp();
const goodTube = {
  name: 'Test tube 9',
  dedication: 'n-type',
  minTempC: 850,
  maxTempC: 1100,
  ambients: ['inert'],
  notes: 'made by a test',
};

describe('tubes', () => {
  it.each(['engineer', 'lead', 'operator', 'admin'] as const)('%s reads the tube list and one tube', async (role) => {
    const agent = await ctx.signIn(role);
    const list = await agent.get('/api/tubes');
    expect(list.status).toBe(200);
    expect(list.body.data.map((t: { name: string }) => t.name)).toContain('Tube 1 · boron');
    const one = await agent.get(`/api/tubes/${list.body.data[0].id}`);
    expect(one.body.data).toEqual(list.body.data[0]);
  });

  it('an admin creates and edits a tube', async () => {
    const admin = await ctx.signIn('admin');
    const made = await admin.post('/api/tubes').send(goodTube);
    expect(made.status).toBe(201);
    expect(made.body.data).toMatchObject(goodTube);
    const edited = await admin.patch(`/api/tubes/${made.body.data.id}`).send({ maxTempC: 1150, ambients: ['inert', 'dry-o2'] });
    expect(edited.status).toBe(200);
    expect(edited.body.data).toMatchObject({ maxTempC: 1150, ambients: ['inert', 'dry-o2'], minTempC: 850 });
  });

  it('refuses a duplicate name with 409', async () => {
    const admin = await ctx.signIn('admin');
    const res = await admin.post('/api/tubes').send({ ...goodTube, name: 'Tube 1 · boron' });
    expect(res.status).toBe(409);
  });

  it.each([
    [{ ...goodTube, minTempC: 1100, maxTempC: 900 }, 'maxTempC'],
    [{ ...goodTube, dedication: 'mixed' }, 'dedication'],
    [{ ...goodTube, ambients: [] }, 'ambients'],
    [{ ...goodTube, ambients: ['forming-gas'] }, 'ambients.0'],
    [{ ...goodTube, minTempC: '900' }, 'minTempC'],
    [{ ...goodTube, name: '' }, 'name'],
  ])('POST /api/tubes answers 400 for %j at %s and stores nothing', async (body, path) => {
    const admin = await ctx.signIn('admin');
    const before = (await ctx.database.db.select().from(tubes)).length;
    const res = await admin.post('/api/tubes').send(body);
    expect(res.status).toBe(400);
    expect(res.body.error.issues.map((i: { path: string }) => i.path)).toContain(path);
    expect(await ctx.database.db.select().from(tubes)).toHaveLength(before);
  });

  it('PATCH that would invert the range against stored values answers 400', async () => {
    const admin = await ctx.signIn('admin');
    const list = await admin.get('/api/tubes');
    const tube = list.body.data[0];
    const res = await admin.patch(`/api/tubes/${tube.id}`).send({ minTempC: tube.maxTempC + 10 });
    expect(res.status).toBe(400);
    expect(res.body.error.issues[0].path).toBe('maxTempC');
    expect((await admin.get(`/api/tubes/${tube.id}`)).body.data.minTempC).toBe(tube.minTempC);
  });

  it('PATCH with unknown fields or nothing answers 400; an unknown tube 404', async () => {
    const admin = await ctx.signIn('admin');
    expect((await admin.patch('/api/tubes/1').send({ colour: 'red' })).status).toBe(400);
    expect((await admin.patch('/api/tubes/1').send({})).status).toBe(400);
    expect((await admin.patch('/api/tubes/99999').send({ notes: 'x' })).status).toBe(404);
    expect((await admin.get('/api/tubes/99999')).status).toBe(404);
  });
});
