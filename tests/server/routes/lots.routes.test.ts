// Lots against released versions, and the travellers they print: the PDF's
// extracted text must hold the caution and the predicted numbers.
import { beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { boronTwoStep } from '../../support/sample-recipes';
import { personOf, useTestApp, type Agent } from '../../support/test-app';
import { compact, flat, pdfPageCount, pdfText } from '../services/traveller/pdf-tools';

const ctx = useTestApp();
let engineer: Agent;
let lead: Agent;
let operator: Agent;
let admin: Agent;
let tubes: { boron: number; anneal: number };
let releasedId: number;
let draftId: number;

const binary = (res: request.Response, cb: (err: Error | null, body: Buffer) => void) => {
  const chunks: Buffer[] = [];
  res.on('data', (c: Buffer) => chunks.push(c));
  res.on('end', () => cb(null, Buffer.concat(chunks)));
};

beforeAll(async () => {
  [engineer, lead, operator, admin] = await Promise.all([ctx.signIn('engineer'), ctx.signIn('lead'), ctx.signIn('operator'), ctx.signIn('admin')]);
  const list = (await engineer.get('/api/tubes')).body.data as Array<{ id: number; name: string }>;
  const id = (part: string) => list.find((t) => t.name.includes(part))!.id;
  tubes = { boron: id('boron'), anneal: id('anneal') };
  const made = await engineer.post('/api/recipes').send({ name: 'Lot recipe', document: boronTwoStep(tubes) });
  releasedId = made.body.data.versions[0].id;
  await engineer.post(`/api/versions/${releasedId}/submit`).send({});
  const signed = await lead.post(`/api/versions/${releasedId}/sign-off`).send({ password: personOf('lead').password, meaning: 'approved-for-production' });
  expect(signed.status).toBe(200);
  draftId = (await engineer.post(`/api/versions/${releasedId}/copy`).send({})).body.data.id;
});

let n = 0;
const lotBody = (over: Record<string, unknown> = {}) => ({ lotCode: `L26-${String(++n).padStart(4, '0')}`, wafers: 25, tubeId: tubes.anneal, versionId: releasedId, ...over });

describe('lots', () => {
  it('an operator opens a lot against a released version', async () => {
    const res = await operator.post('/api/lots').send(lotBody({ notes: 'first lot' }));
    expect(res.status).toBe(201);
    expect(res.body.data).toMatchObject({ wafers: 25, status: 'open', recipe: { name: 'Lot recipe' }, version: { versionNo: 1, state: 'released' }, openedBy: { name: personOf('operator').name } });
    const list = (await lead.get('/api/lots')).body.data;
    expect(list.map((l: { id: number }) => l.id)).toContain(res.body.data.id);
    expect((await admin.get(`/api/lots/${res.body.data.id}`)).body.data.lotCode).toBe(res.body.data.lotCode);
  });

  it('refuses a lot against a version that is not released (422) and stores nothing', async () => {
    const body = lotBody({ versionId: draftId });
    const res = await engineer.post('/api/lots').send(body);
    expect(res.status).toBe(422);
    expect(res.body.error.code).toBe('not_released');
    expect(res.body.error.issues[0].path).toBe('versionId');
    const list = (await engineer.get('/api/lots')).body.data;
    expect(list.map((l: { lotCode: string }) => l.lotCode)).not.toContain(body.lotCode);
  });

  it('refuses a duplicate lot id (409), an unknown tube (422) and bad fields (400)', async () => {
    const body = lotBody();
    expect((await operator.post('/api/lots').send(body)).status).toBe(201);
    expect((await operator.post('/api/lots').send(body)).status).toBe(409);
    expect((await operator.post('/api/lots').send(lotBody({ tubeId: 9999 }))).status).toBe(422);
    const bad = await operator.post('/api/lots').send({ lotCode: 'a b', wafers: 0, tubeId: 'x' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.issues.map((i: { path: string }) => i.path).sort()).toEqual(['lotCode', 'tubeId', 'versionId', 'wafers']);
  });

  it('leads and admins do not open lots (403)', async () => {
    expect((await lead.post('/api/lots').send(lotBody())).status).toBe(403);
    expect((await admin.post('/api/lots').send(lotBody())).status).toBe(403);
  });

  it('an operator moves a lot through its statuses', async () => {
    const lot = (await operator.post('/api/lots').send(lotBody())).body.data;
    const res = await operator.patch(`/api/lots/${lot.id}`).send({ status: 'in_progress' });
    expect(res.body.data.status).toBe('in_progress');
    expect((await operator.patch(`/api/lots/${lot.id}`).send({ status: 'lost' })).status).toBe(400);
    expect((await operator.patch(`/api/lots/${lot.id}`).send({ status: 'open' })).status).toBe(409);
    expect((await operator.patch(`/api/lots/${lot.id}`).send({ status: 'complete' })).body.data.status).toBe('complete');
    const back = await operator.patch(`/api/lots/${lot.id}`).send({ status: 'in_progress' });
    expect(back.status).toBe(409);
    expect(back.body.error.issues[0].path).toBe('status');
    expect((await operator.patch('/api/lots/99999').send({ status: 'complete' })).status).toBe(404);
  });
});

describe('run travellers', () => {
  it('a released lot prints a runnable traveller with the predicted numbers and the safety caution', async () => {
    const lot = (await operator.post('/api/lots').send(lotBody())).body.data;
    const res = await operator.get(`/api/lots/${lot.id}/traveller.pdf`).buffer(true).parse(binary);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    const text = flat(pdfText(res.body as Buffer));
    const version = (await engineer.get(`/api/versions/${releasedId}`)).body.data;
    expect(text).toContain(lot.lotCode);
    expect(text).toContain(version.result.final.junctionDepthsUm[0].toFixed(3));
    expect(text).toContain(version.result.final.sheetResistanceOhmSq.toFixed(1));
    expect(text).toMatch(/BBr3/);
    expect(text).toMatch(/Safety Data Sheet/);
    expect(text).toMatch(/EHS/);
    expect(text).toContain(personOf('lead').name);
    expect(compact(pdfText(res.body as Buffer))).not.toContain('NOTRELEASED');
  });

  it('a draft prints only as a preview marked NOT RELEASED — DO NOT RUN', async () => {
    const res = await engineer.get(`/api/versions/${draftId}/traveller.pdf`).buffer(true).parse(binary);
    expect(res.status).toBe(200);
    expect(compact(pdfText(res.body as Buffer))).toContain('NOTRELEASED');
    expect((await operator.get(`/api/versions/${draftId}/traveller.pdf`)).status).toBe(404);
  });

  it('prints many lots in one PDF, streaming progress', async () => {
    const ids: number[] = [];
    for (let i = 0; i < 3; i++) ids.push((await operator.post('/api/lots').send(lotBody())).body.data.id);
    const res = await operator.post('/api/lots/travellers').send({ lotIds: ids }).buffer(true).parse((r, cb) => {
      let text = '';
      r.setEncoding('utf8');
      r.on('data', (c: string) => (text += c));
      r.on('end', () => cb(null, text));
    });
    expect(res.status).toBe(200);
    const lines = (res.body as string).trim().split('\n').map((l) => JSON.parse(l));
    expect(lines.slice(0, -1).map((l) => l.progress.done)).toEqual([0, 1, 2, 3]);
    const pdf = Buffer.from(lines.at(-1).pdf, 'base64');
    expect(pdfPageCount(pdf)).toBeGreaterThanOrEqual(3);
    expect((await operator.post('/api/lots/travellers').send({ lotIds: [] })).status).toBe(400);
    expect((await operator.post('/api/lots/travellers').send({ lotIds: [99999] })).status).toBe(404);
  });
});
