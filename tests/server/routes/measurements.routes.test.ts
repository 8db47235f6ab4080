// Uploads against a lot, the comparison with the prediction, and per-tube
// calibration that recovers a known factor from synthetic measured lots.
import { beforeAll, describe, expect, it } from 'vitest';
import { measurements } from '../../../server/db/schema';
import { syntheticProfileCsv, syntheticSheetCsv } from '../../../server/db/demo-measurements';
import { parseRecipeDocument } from '../../../shared/schemas/recipe';
import { boronTwoStep } from '../../support/sample-recipes';
import { personOf, useTestApp, type Agent } from '../../support/test-app';

const ctx = useTestApp();
let engineer: Agent;
let lead: Agent;
let operator: Agent;
let admin: Agent;
let tubes: { boron: number; anneal: number };

beforeAll(async () => {
  [engineer, lead, operator, admin] = await Promise.all([ctx.signIn('engineer'), ctx.signIn('lead'), ctx.signIn('operator'), ctx.signIn('admin')]);
  const list = (await engineer.get('/api/tubes')).body.data as Array<{ id: number; name: string }>;
  const id = (part: string) => list.find((t) => t.name.includes(part))!.id;
  tubes = { boron: id('boron'), anneal: id('anneal') };
});

let seq = 0;
/** A released boron recipe with drive-in `minutes` in `annealTube`, and a lot in that tube. */
async function releasedLot(minutes = 60, annealTube = tubes.anneal) {
  const document = boronTwoStep({ ...tubes, anneal: annealTube }) as { steps: Array<Record<string, unknown>> };
  document.steps[1].timeMin = minutes;
  const made = await engineer.post('/api/recipes').send({ name: `Measured ${++seq}`, document });
  const versionId = made.body.data.versions[0].id;
  await engineer.post(`/api/versions/${versionId}/submit`).send({});
  await lead.post(`/api/versions/${versionId}/sign-off`).send({ password: personOf('lead').password, meaning: 'approved-for-production' });
  const lot = await operator.post('/api/lots').send({ lotCode: `M-${seq}-${Date.now() % 100000}`, wafers: 5, tubeId: annealTube, versionId });
  expect(lot.status).toBe(201);
  const parsed = parseRecipeDocument(document);
  if (!parsed.ok) throw new Error('bad test document');
  return { lotId: lot.body.data.id as number, doc: parsed.doc };
}

const upload = (agent: Agent, lotId: number, name: string, text: string, fields: Record<string, string>) => {
  let req = agent.post(`/api/lots/${lotId}/measurements`);
  for (const [k, v] of Object.entries(fields)) req = req.field(k, v);
  return req.attach('file', Buffer.from(text), { filename: name, contentType: 'text/csv' });
};

describe('uploads', () => {
  it('a profile and four-point-probe readings are stored and compared with the prediction', async () => {
    const { lotId, doc } = await releasedLot();
    const options = { factor: 1, tubeId: tubes.anneal, noisePct: 0, seed: 1 };
    const p = await upload(operator, lotId, 'sims.csv', syntheticProfileCsv(doc, options), { kind: 'profile', method: 'SIMS' });
    expect(p.status).toBe(201);
    expect(p.body.data).toMatchObject({ kind: 'profile', method: 'SIMS', fileName: 'sims.csv', summary: { species: 'B' } });
    const s = await upload(engineer, lotId, 'rs.csv', syntheticSheetCsv(doc, options), { kind: 'sheet_resistance' });
    expect(s.status).toBe(201);
    const res = await admin.get(`/api/lots/${lotId}/measurements`);
    expect(res.body.data.measurements).toHaveLength(2);
    const c = res.body.data.comparison;
    // The synthetic files come from the same model without noise: they agree closely.
    expect(Math.abs(c.delta.junctionDepthPct)).toBeLessThan(2);
    expect(Math.abs(c.delta.sheetResistancePct)).toBeLessThan(0.5);
  });

  it('a file with any bad row stores nothing and names the lines', async () => {
    const { lotId } = await releasedLot();
    const before = (await ctx.database.db.select().from(measurements)).length;
    const res = await upload(operator, lotId, 'bad.csv', 'depth (um),concentration (cm^-3)\n0,1e20\n0.1,oops\n0.2,1e18\n', { kind: 'profile' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid_file');
    expect(res.body.error.issues).toEqual([{ path: 'file.line.3', message: 'Line 3: concentration "oops" must be a number ≥ 0' }]);
    expect(await ctx.database.db.select().from(measurements)).toHaveLength(before);
  });

  it.each([
    ['a file that is not CSV', 'notes.pdf', 'application/pdf', 415],
    ['no file', null, null, 400],
  ])('refuses %s', async (_what, name, type, status) => {
    const { lotId } = await releasedLot();
    let req = operator.post(`/api/lots/${lotId}/measurements`).field('kind', 'profile');
    if (name) req = req.attach('file', Buffer.from('x'), { filename: name, contentType: type! });
    const res = await req;
    expect(res.status).toBe(status);
    expect(res.body.error.issues[0].path).toBe('file');
  });

  it('refuses a file over 2 MB with 413', async () => {
    const { lotId } = await releasedLot();
    const big = 'depth (um),concentration (cm^-3)\n' + '0.1,1e18\n'.repeat(260_000);
    const res = await upload(operator, lotId, 'big.csv', big, { kind: 'profile' });
    expect(res.status).toBe(413);
  });

  it('refuses a bad kind and an unknown lot; leads and admins do not upload', async () => {
    const { lotId } = await releasedLot();
    const csv = 'site,sheet_resistance (ohm/sq)\nC,100\n';
    expect((await upload(operator, lotId, 'rs.csv', csv, { kind: 'hall' })).status).toBe(400);
    expect((await upload(operator, 99999, 'rs.csv', csv, { kind: 'sheet_resistance' })).status).toBe(404);
    expect((await upload(lead, lotId, 'rs.csv', csv, { kind: 'sheet_resistance' })).status).toBe(403);
    expect((await upload(admin, lotId, 'rs.csv', csv, { kind: 'sheet_resistance' })).status).toBe(403);
  });
});

describe('calibration', () => {
  it('recovers a known diffusivity factor from synthetic measured lots, and recipes that opt in use it', async () => {
    const factor = 1.4;
    const tube = (
      await admin.post('/api/tubes').send({ name: 'Calibration test tube', dedication: 'undoped', minTempC: 700, maxTempC: 1200, ambients: ['inert'] })
    ).body.data.id as number;
    for (const [i, minutes] of [30, 60, 120].entries()) {
      const { lotId, doc } = await releasedLot(minutes, tube);
      const csv = syntheticProfileCsv(doc, { factor, tubeId: tube, noisePct: 2, seed: 10 + i });
      expect((await upload(operator, lotId, `sims-${i}.csv`, csv, { kind: 'profile' })).status).toBe(201);
    }
    const fit = await engineer.post(`/api/tubes/${tube}/calibrations`).send({ note: 'first fit' });
    expect(fit.status).toBe(201);
    // The predep in the boron tube is not scaled, so the anneal tube's factor carries it all.
    expect(fit.body.data.factor).toBeGreaterThan(1.25);
    expect(fit.body.data.factor).toBeLessThan(1.55);
    expect(fit.body.data.points).toBe(3);
    expect(fit.body.data.rmsLogErrorAfter).toBeLessThan(fit.body.data.rmsLogErrorBefore);
    const history = (await operator.get(`/api/tubes/${tube}/calibrations`)).body.data;
    expect(history[0].id).toBe(fit.body.data.id);
    expect((await operator.get('/api/calibrations/active')).body.data[tube]).toBeCloseTo(fit.body.data.factor, 10);

    const onTube = { ...tubes, anneal: tube };
    const opted = boronTwoStep(onTube) as { options?: Record<string, unknown> };
    opted.options = { useTubeCalibration: true };
    const withCal = (await engineer.post('/api/compute').send(opted)).body.data;
    const without = (await engineer.post('/api/compute').send(boronTwoStep(onTube))).body.data;
    expect(withCal.calibration.factors).toEqual([{ tubeId: tube, factor: fit.body.data.factor }]);
    expect(withCal.final.junctionDepthsUm[0]).toBeGreaterThan(without.final.junctionDepthsUm[0]);
    expect(without.calibration).toEqual({ optedIn: false, factors: [] });
  });

  it('refuses a fit without enough measured lots (422), and operators may not fit (403)', async () => {
    expect((await engineer.post(`/api/tubes/${tubes.boron}/calibrations`).send({})).status).toBe(422);
    expect((await operator.post(`/api/tubes/${tubes.boron}/calibrations`).send({})).status).toBe(403);
    expect((await engineer.post('/api/tubes/99999/calibrations').send({})).status).toBe(404);
  });
});
