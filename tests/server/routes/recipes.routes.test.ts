import { beforeAll, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import { recipeVersions, recipes } from '../../../server/db/schema';
import { backfillReleasedListColumns } from '../../../server/services/recipes.service';
import { boronTwoStep } from '../../support/sample-recipes';
import { useTestApp, type Agent } from '../../support/test-app';

const ctx = useTestApp();
let tubes: { boron: number; anneal: number; phos: number };
let engineer: Agent;

beforeAll(async () => {
  engineer = await ctx.signIn('engineer');
  const list = (await engineer.get('/api/tubes')).body.data as Array<{ id: number; name: string }>;
  const id = (part: string) => list.find((t) => t.name.includes(part))!.id;
  tubes = { boron: id('boron'), anneal: id('anneal'), phos: id('phosphorus') };
});

async function createRecipe(agent: Agent, name: string, document = boronTwoStep(tubes)) {
  const res = await agent.post('/api/recipes').send({ name, description: 'test', document });
  expect(res.status).toBe(201);
  return res.body.data as { id: number; versions: Array<{ id: number; versionNo: number; state: string }> };
}

describe('recipes', () => {
  it('an engineer creates a recipe; version 1 is a draft with the server result stored', async () => {
    const made = await createRecipe(engineer, 'Base boron');
    expect(made.versions).toHaveLength(1);
    const v = (await engineer.get(`/api/versions/${made.versions[0].id}`)).body.data;
    expect(v).toMatchObject({ versionNo: 1, state: 'draft', revision: 1, recipeName: 'Base boron' });
    expect(v.result.engineVersion).toMatch(/^\d+\.\d+\.\d+$/);
    expect(v.result.final.junctionDepthsUm[0]).toBeGreaterThan(0.3);
    expect(v.parameterSetId).toBe(v.result.parameterSetId);
    expect(v.contentHash).toMatch(/^[0-9a-f]{64}$/);
    expect(v.tubeIssues).toEqual([]);
  });

  it('creates an empty recipe without a document', async () => {
    const res = await engineer.post('/api/recipes').send({ name: 'Empty start' });
    expect(res.status).toBe(201);
    const v = (await engineer.get(`/api/versions/${res.body.data.versions[0].id}`)).body.data;
    expect(v.document.steps).toEqual([]);
  });

  it('refuses a duplicate name with 409', async () => {
    await createRecipe(engineer, 'Twice');
    const res = await engineer.post('/api/recipes').send({ name: 'Twice' });
    expect(res.status).toBe(409);
  });

  it('import: a bad document answers 400 naming document fields, and stores nothing', async () => {
    const before = (await ctx.database.db.select().from(recipes)).length;
    const doc = boronTwoStep(tubes) as { steps: Array<Record<string, unknown>> };
    doc.steps[0].tempC = '2000 degC';
    doc.steps[1].timeMin = '30 kg';
    const res = await engineer.post('/api/recipes').send({ name: 'Broken import', document: doc });
    expect(res.status).toBe(400);
    const paths = res.body.error.issues.map((i: { path: string }) => i.path);
    expect(paths).toEqual(expect.arrayContaining(['document.steps.0.tempC', 'document.steps.1.timeMin']));
    expect(await ctx.database.db.select().from(recipes)).toHaveLength(before);
  });

  it('lists with paging, sorting and filters by name, dopant, state, owner and tube', async () => {
    await createRecipe(engineer, 'Filter boron A');
    const phos = boronTwoStep(tubes) as { steps: Array<Record<string, unknown>> };
    phos.steps[0] = { ...phos.steps[0], dopant: 'P', tubeId: tubes.phos };
    await createRecipe(engineer, 'Filter phos B', phos as never);
    const byDopant = (await engineer.get('/api/recipes?dopant=P')).body.data;
    expect(byDopant.rows.map((r: { name: string }) => r.name)).toEqual(['Filter phos B']);
    const byName = (await engineer.get('/api/recipes?name=filter&sort=name&order=asc')).body.data;
    expect(byName.rows.map((r: { name: string }) => r.name)).toEqual(['Filter boron A', 'Filter phos B']);
    const byTube = (await engineer.get(`/api/recipes?tubeId=${tubes.phos}`)).body.data;
    expect(byTube.total).toBe(1);
    const page = (await engineer.get('/api/recipes?pageSize=2&page=1&sort=name')).body.data;
    expect(page.rows).toHaveLength(2);
    expect(page.total).toBeGreaterThanOrEqual(4);
    const me = (await engineer.get('/api/me')).body.data;
    const mine = (await engineer.get(`/api/recipes?ownerId=${me.id}&state=draft`)).body.data;
    expect(mine.total).toBe(page.total);
  });

  it.each([
    ['page=0', 'page'],
    ['pageSize=1000', 'pageSize'],
    ['sort=colour', 'sort'],
    ['dopant=Ga', 'dopant'],
    ['state=burnt', 'state'],
  ])('GET /api/recipes?%s answers 400 at %s', async (qs, path) => {
    const res = await engineer.get(`/api/recipes?${qs}`);
    expect(res.status).toBe(400);
    expect(res.body.error.issues[0].path).toBe(path);
  });

  it('operators see no drafts: the list hides them and reads are 404', async () => {
    const made = await createRecipe(engineer, 'Hidden draft');
    const operator = await ctx.signIn('operator');
    const list = (await operator.get('/api/recipes')).body.data;
    expect(list.rows.map((r: { name: string }) => r.name)).not.toContain('Hidden draft');
    expect((await operator.get(`/api/recipes/${made.id}`)).status).toBe(404);
    expect((await operator.get(`/api/versions/${made.versions[0].id}`)).status).toBe(404);
  });

  it('operators list and filter by the released version, never by a newer draft', async () => {
    const made = await createRecipe(engineer, 'Released boron, phos draft');
    const v1 = made.versions[0].id;
    const lead = await ctx.signIn('lead');
    await engineer.post(`/api/versions/${v1}/submit`).send({});
    expect((await lead.post(`/api/versions/${v1}/sign-off`).send({ password: 'demo-lead-pass', meaning: 'approved-for-production' })).status).toBe(200);
    const v2 = (await engineer.post(`/api/versions/${v1}/copy`).send({})).body.data;
    v2.document.steps[0].dopant = 'P';
    v2.document.steps[0].tubeId = tubes.phos;
    expect((await engineer.put(`/api/versions/${v2.id}`).send({ revision: v2.revision, document: v2.document })).status).toBe(200);
    const operator = await ctx.signIn('operator');
    const row = (await operator.get('/api/recipes?name=phos%20draft')).body.data.rows[0];
    expect(row.dopants).toEqual(['B']);
    expect((await operator.get('/api/recipes?dopant=P&name=phos%20draft')).body.data.total).toBe(0);
    expect((await engineer.get('/api/recipes?dopant=P&name=phos%20draft')).body.data.total).toBe(1);
  });

  it('backfills the released list columns of recipes released before they existed', async () => {
    const row = (await engineer.get('/api/recipes?name=phos%20draft')).body.data.rows[0];
    await ctx.database.db.update(recipes).set({ releasedDopants: '', releasedTubeIds: '' }).where(eq(recipes.id, row.id));
    expect(await backfillReleasedListColumns(ctx.database.db)).toBeGreaterThanOrEqual(1);
    const operator = await ctx.signIn('operator');
    expect((await operator.get('/api/recipes?name=phos%20draft')).body.data.rows[0].dopants).toEqual(['B']);
    expect(await backfillReleasedListColumns(ctx.database.db)).toBe(0);
  });

  it('filters by the day of the last change', async () => {
    await createRecipe(engineer, 'Changed today');
    const today = new Date().toISOString().slice(0, 10);
    expect((await engineer.get(`/api/recipes?name=Changed%20today&changedFrom=${today}&changedTo=${today}`)).body.data.total).toBe(1);
    expect((await engineer.get('/api/recipes?name=Changed%20today&changedTo=2020-01-01')).body.data.total).toBe(0);
    expect((await engineer.get('/api/recipes?changedFrom=yesterday')).status).toBe(400);
  });

  it('PATCH renames (owner or lead only)', async () => {
    const made = await createRecipe(engineer, 'To rename');
    const res = await engineer.patch(`/api/recipes/${made.id}`).send({ name: 'Renamed' });
    expect(res.body.data.name).toBe('Renamed');
    const other = await ctx.signIn('engineer', 'engineer2@pilotline.example', 'demo-engineer-2');
    expect((await other.patch(`/api/recipes/${made.id}`).send({ name: 'Mine now' })).status).toBe(403);
    const lead = await ctx.signIn('lead');
    expect((await lead.patch(`/api/recipes/${made.id}`).send({ description: 'lead note' })).status).toBe(200);
    expect((await engineer.patch(`/api/recipes/${made.id}`).send({})).status).toBe(400);
  });
});

describe('versions', () => {
  it('saves a draft and bumps the revision; a stale save gets 409 and changes nothing', async () => {
    const made = await createRecipe(engineer, 'Concurrency');
    const id = made.versions[0].id;
    const v1 = (await engineer.get(`/api/versions/${id}`)).body.data;
    const doc = structuredClone(v1.document);
    doc.steps[1].timeMin = 90;
    const saved = await engineer.put(`/api/versions/${id}`).send({ revision: 1, document: doc, note: 'longer drive' });
    expect(saved.status).toBe(200);
    expect(saved.body.data.revision).toBe(2);
    expect(saved.body.data.result.final.junctionDepthsUm[0]).toBeGreaterThan(v1.result.final.junctionDepthsUm[0]);
    const stale = structuredClone(v1.document);
    stale.steps[1].timeMin = 10;
    const res = await engineer.put(`/api/versions/${id}`).send({ revision: 1, document: stale });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('stale');
    const now = (await engineer.get(`/api/versions/${id}`)).body.data;
    expect(now.document.steps[1].timeMin).toBe(90);
    expect(now.revision).toBe(2);
  });

  it('a version that has left Draft refuses every write with 409', async () => {
    const made = await createRecipe(engineer, 'Frozen');
    const id = made.versions[0].id;
    await ctx.database.db.update(recipeVersions).set({ state: 'released' }).where(eq(recipeVersions.id, id));
    const v = (await engineer.get(`/api/versions/${id}`)).body.data;
    const res = await engineer.put(`/api/versions/${id}`).send({ revision: v.revision, document: v.document });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('not_draft');
  });

  it('"new version from this one" copies any version into the next draft', async () => {
    const made = await createRecipe(engineer, 'Copy me');
    const id = made.versions[0].id;
    const copy = await engineer.post(`/api/versions/${id}/copy`).send({});
    expect(copy.status).toBe(201);
    expect(copy.body.data).toMatchObject({ versionNo: 2, state: 'draft', basedOnVersionId: id, note: 'From version 1' });
    const detail = (await engineer.get(`/api/recipes/${made.id}`)).body.data;
    expect(detail.versions.map((v: { versionNo: number }) => v.versionNo)).toEqual([2, 1]);
    expect(detail.latestVersionNo).toBe(2);
  });

  it('another engineer may not save someone else\'s draft, but may copy it', async () => {
    const made = await createRecipe(engineer, 'Not yours');
    const id = made.versions[0].id;
    const other = await ctx.signIn('engineer', 'engineer2@pilotline.example', 'demo-engineer-2');
    const v = (await other.get(`/api/versions/${id}`)).body.data;
    expect((await other.put(`/api/versions/${id}`).send({ revision: 1, document: v.document })).status).toBe(403);
    expect((await other.post(`/api/versions/${id}/copy`).send({})).status).toBe(201);
  });

  it('flags steps that break their tube\'s dedication, range or ambient', async () => {
    const doc = boronTwoStep(tubes) as { steps: Array<Record<string, unknown>> };
    doc.steps[0].tubeId = tubes.phos; // boron source in the phosphorus tube
    doc.steps[1].tempC = 1250; // above the anneal tube's range
    const made = await createRecipe(engineer, 'Wrong tubes', doc as never);
    const v = (await engineer.get(`/api/versions/${made.versions[0].id}`)).body.data;
    expect(v.tubeIssues.map((i: { path: string }) => i.path)).toEqual(['steps.0.tubeId', 'steps.1.tempC']);
  });

  it.each([
    [{ revision: 1 }, 'document'],
    [{ document: {} }, 'revision'],
    [{ revision: 'one', document: {} }, 'revision'],
  ])('PUT with %j answers 400 naming %s', async (body, path) => {
    const made = await createRecipe(engineer, `Bad put ${path} ${Math.random()}`);
    const res = await engineer.put(`/api/versions/${made.versions[0].id}`).send(body);
    expect(res.status).toBe(400);
    expect(res.body.error.issues.map((i: { path: string }) => i.path)).toContain(path);
  });

  it('unknown versions are 404', async () => {
    expect((await engineer.get('/api/versions/999999')).status).toBe(404);
    expect((await engineer.post('/api/versions/999999/copy').send({})).status).toBe(404);
  });
});

describe('POST /api/compute', () => {
  it('returns the engine result for a document with units', async () => {
    const doc = boronTwoStep(tubes) as { steps: Array<Record<string, unknown>> };
    doc.steps[0].tempC = '950 degC';
    doc.steps[1].timeMin = '1 h';
    const res = await engineer.post('/api/compute').send(doc);
    expect(res.status).toBe(200);
    expect(res.body.data.steps).toHaveLength(2);
    expect(res.body.data.steps[1].timeMin).toBe(60);
  });

  it('answers 400 with field paths for a bad document', async () => {
    const res = await engineer.post('/api/compute').send({ schemaVersion: 1, substrate: { type: 'x' }, steps: 'none' });
    expect(res.status).toBe(400);
    const paths = res.body.error.issues.map((i: { path: string }) => i.path);
    expect(paths).toEqual(expect.arrayContaining(['substrate.type', 'steps']));
  });
});
