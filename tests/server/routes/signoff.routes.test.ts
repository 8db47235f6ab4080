// The sign-off chain through the API: every allowed and refused transition per
// role, self-sign-off, wrong password, the concurrent-signature race, audit
// rows in the same transaction, and the e-mails the SMTP fake receives.
import { beforeAll, describe, expect, it } from 'vitest';
import { and, eq } from 'drizzle-orm';
import { auditEvents, outboxMessages } from '../../../server/db/schema';
import { boronTwoStep } from '../../support/sample-recipes';
import { personOf, TEST_APP_URL, useTestApp, type Agent } from '../../support/test-app';

const ctx = useTestApp();
let tubes: { boron: number; anneal: number; phos: number };
let engineer: Agent;
let engineer2: Agent;
let lead: Agent;
let lead2: Agent;
let operator: Agent;
let admin: Agent;

beforeAll(async () => {
  [engineer, lead, operator, admin] = await Promise.all([ctx.signIn('engineer'), ctx.signIn('lead'), ctx.signIn('operator'), ctx.signIn('admin')]);
  engineer2 = await ctx.signIn('engineer', 'engineer2@pilotline.example', 'demo-engineer-2');
  lead2 = await ctx.signIn('lead', 'lead2@pilotline.example', 'demo-lead-pass2');
  const list = (await engineer.get('/api/tubes')).body.data as Array<{ id: number; name: string }>;
  const id = (part: string) => list.find((t) => t.name.includes(part))!.id;
  tubes = { boron: id('boron'), anneal: id('anneal'), phos: id('phosphorus') };
});

let seq = 0;
/** A new recipe by `author`, its version 1 a draft; returns ids. */
async function draft(author: Agent = engineer, document = boronTwoStep(tubes)) {
  const res = await author.post('/api/recipes').send({ name: `Sign-off ${++seq}`, document });
  expect(res.status).toBe(201);
  return { recipeId: res.body.data.id as number, versionId: res.body.data.versions[0].id as number };
}

const SIGN = { password: personOf('lead').password, meaning: 'approved-for-production' };

/** Submitted, and its mail delivered, so later mail assertions see only what follows. */
async function inReview(author: Agent = engineer) {
  const ids = await draft(author);
  expect((await author.post(`/api/versions/${ids.versionId}/submit`).send({ note: 'ready' })).status).toBe(200);
  await ctx.created.flushMail();
  return ids;
}

async function released() {
  const ids = await inReview();
  expect((await lead.post(`/api/versions/${ids.versionId}/sign-off`).send(SIGN)).status).toBe(200);
  return ids;
}

const stateOf = async (versionId: number) => (await engineer.get(`/api/versions/${versionId}`)).body.data.state;

async function auditFor(versionId: number) {
  return ctx.database.db
    .select()
    .from(auditEvents)
    .where(and(eq(auditEvents.entityType, 'recipe_version'), eq(auditEvents.entityId, versionId)))
    .orderBy(auditEvents.id);
}

describe('submit', () => {
  it('the author submits a draft: In review, an audit row, and mail to the leads with a link', async () => {
    await ctx.created.flushMail();
    const before = ctx.smtp.received.length;
    const { versionId, recipeId } = await inReview();
    expect(await stateOf(versionId)).toBe('in_review');
    const audit = await auditFor(versionId);
    expect(audit.at(-1)).toMatchObject({ action: 'version.submit', fromState: 'draft', toState: 'in_review', actorRole: 'engineer', comment: 'ready' });
    expect(audit.at(-1)!.contentHash).toMatch(/^[0-9a-f]{64}$/);
    await ctx.created.flushMail();
    const mail = ctx.smtp.received.slice(before);
    expect(mail).toHaveLength(1);
    expect(mail[0].to.sort()).toEqual(['lead2@pilotline.example', 'lead@pilotline.example']);
    expect(mail[0].raw).toContain(`${TEST_APP_URL}/recipes/${recipeId}?version=${versionId}`);
    expect(mail[0].subject).toMatch(/awaits your sign-off/);
  });

  it.each([
    ['another engineer', () => engineer2, 403],
    ['an operator', () => operator, 403],
    ['an admin', () => admin, 403],
  ])('%s may not submit someone else\'s draft', async (_who, agent, status) => {
    const { versionId } = await draft();
    expect((await agent().post(`/api/versions/${versionId}/submit`).send({})).status).toBe(status);
    expect(await stateOf(versionId)).toBe('draft');
  });

  it('a lead may submit an engineer\'s draft', async () => {
    const { versionId } = await draft();
    expect((await lead.post(`/api/versions/${versionId}/submit`).send({})).status).toBe(200);
  });

  it('is refused with 422 while a step breaks its tube\'s rules, naming the field', async () => {
    const doc = boronTwoStep(tubes) as { steps: Array<Record<string, unknown>> };
    doc.steps[0].tubeId = tubes.phos;
    const { versionId } = await draft(engineer, doc as never);
    const res = await engineer.post(`/api/versions/${versionId}/submit`).send({});
    expect(res.status).toBe(422);
    expect(res.body.error.code).toBe('tube_rules');
    expect(res.body.error.issues[0].path).toBe('steps.0.tubeId');
    expect(await stateOf(versionId)).toBe('draft');
    expect(await auditFor(versionId)).toHaveLength(1);
  });

  it('only a draft can be submitted (409)', async () => {
    const { versionId } = await inReview();
    expect((await engineer.post(`/api/versions/${versionId}/submit`).send({})).status).toBe(409);
  });
});

describe('sign-off', () => {
  it('a lead signs with password and meaning: Released, signature stored, author told by e-mail', async () => {
    const { versionId } = await inReview();
    const before = ctx.smtp.received.length;
    const res = await lead.post(`/api/versions/${versionId}/sign-off`).send(SIGN);
    expect(res.status).toBe(200);
    expect(res.body.data).toMatchObject({ state: 'released', releasedBy: { name: personOf('lead').name } });
    expect(res.body.data.releasedAt).toBeTruthy();
    const audit = await auditFor(versionId);
    expect(audit.at(-1)).toMatchObject({ action: 'version.release', fromState: 'in_review', toState: 'released', actorRole: 'lead' });
    await ctx.created.flushMail();
    const mail = ctx.smtp.received.slice(before);
    expect(mail.map((m) => m.to)).toEqual([[personOf('engineer').email]]);
    expect(mail[0].subject).toMatch(/released/);
  });

  it('refuses a wrong password (403) and changes nothing', async () => {
    const { versionId } = await inReview();
    const res = await lead.post(`/api/versions/${versionId}/sign-off`).send({ ...SIGN, password: 'wrong-password' });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('wrong_password');
    expect(await stateOf(versionId)).toBe('in_review');
  });

  it('refuses a missing meaning or password (400)', async () => {
    const { versionId } = await inReview();
    const res = await lead.post(`/api/versions/${versionId}/sign-off`).send({});
    expect(res.status).toBe(400);
    expect(res.body.error.issues.map((i: { path: string }) => i.path).sort()).toEqual(['meaning', 'password']);
  });

  it('a lead never signs a version they wrote', async () => {
    const { versionId } = await inReview(lead);
    const res = await lead.post(`/api/versions/${versionId}/sign-off`).send(SIGN);
    expect(res.status).toBe(403);
    expect(await stateOf(versionId)).toBe('in_review');
    expect((await lead2.post(`/api/versions/${versionId}/sign-off`).send({ ...SIGN, password: 'demo-lead-pass2' })).status).toBe(200);
  });

  it.each([
    ['engineer', () => engineer],
    ['operator', () => operator],
    ['admin', () => admin],
  ])('%s may not sign (403)', async (_who, agent) => {
    const { versionId } = await inReview(engineer2);
    expect((await agent().post(`/api/versions/${versionId}/sign-off`).send(SIGN)).status).toBe(403);
  });

  it('a draft cannot be signed (409)', async () => {
    const { versionId } = await draft();
    expect((await lead.post(`/api/versions/${versionId}/sign-off`).send(SIGN)).status).toBe(409);
  });

  it('two leads signing at once: exactly one succeeds, the other gets 409', async () => {
    const { versionId } = await inReview();
    const [a, b] = await Promise.all([
      lead.post(`/api/versions/${versionId}/sign-off`).send(SIGN),
      lead2.post(`/api/versions/${versionId}/sign-off`).send({ ...SIGN, password: 'demo-lead-pass2' }),
    ]);
    expect([a.status, b.status].sort()).toEqual([200, 409]);
    const releases = (await auditFor(versionId)).filter((e) => e.action === 'version.release');
    expect(releases).toHaveLength(1);
  });

  it('a new release retires the previous one of the same recipe', async () => {
    const { recipeId, versionId: v1 } = await released();
    const copy = await engineer.post(`/api/versions/${v1}/copy`).send({});
    const v2 = copy.body.data.id;
    await engineer.post(`/api/versions/${v2}/submit`).send({});
    await lead.post(`/api/versions/${v2}/sign-off`).send(SIGN);
    expect(await stateOf(v1)).toBe('retired');
    expect(await stateOf(v2)).toBe('released');
    const recipe = (await engineer.get(`/api/recipes/${recipeId}`)).body.data;
    expect(recipe).toMatchObject({ latestState: 'released', releasedVersionNo: 2 });
    expect((await auditFor(v1)).at(-1)).toMatchObject({ action: 'version.retire', comment: 'Superseded by version 2' });
  });
});

describe('return and retire', () => {
  it('a lead returns a version with a comment: Draft again, editable, author told', async () => {
    const { versionId } = await inReview();
    const before = ctx.smtp.received.length;
    const res = await lead.post(`/api/versions/${versionId}/return`).send({ comment: 'Drive-in too long for the spec' });
    expect(res.status).toBe(200);
    expect(res.body.data.state).toBe('draft');
    expect((await auditFor(versionId)).at(-1)).toMatchObject({ action: 'version.return', comment: 'Drive-in too long for the spec' });
    const v = (await engineer.get(`/api/versions/${versionId}`)).body.data;
    expect((await engineer.put(`/api/versions/${versionId}`).send({ revision: v.revision, document: v.document })).status).toBe(200);
    await ctx.created.flushMail();
    const mail = ctx.smtp.received.slice(before);
    expect(mail[0].to).toEqual([personOf('engineer').email]);
    expect(mail[0].raw).toContain('Drive-in too long for the spec');
  });

  it('returning needs a comment (400) and a lead who is not the author (403)', async () => {
    const { versionId } = await inReview();
    expect((await lead.post(`/api/versions/${versionId}/return`).send({})).status).toBe(400);
    expect((await engineer.post(`/api/versions/${versionId}/return`).send({ comment: 'no' })).status).toBe(403);
    const own = await inReview(lead);
    expect((await lead.post(`/api/versions/${own.versionId}/return`).send({ comment: 'my own' })).status).toBe(403);
  });

  it('a lead retires a released version; nobody else may; only a released one (409)', async () => {
    const { versionId } = await released();
    expect((await engineer.post(`/api/versions/${versionId}/retire`).send({})).status).toBe(403);
    expect((await lead.post(`/api/versions/${versionId}/retire`).send({ comment: 'obsolete' })).status).toBe(200);
    expect(await stateOf(versionId)).toBe('retired');
    expect((await lead.post(`/api/versions/${versionId}/retire`).send({})).status).toBe(409);
  });
});

describe('queue, audit trail and outbox', () => {
  it('the queue lists versions in review with the released one to compare against', async () => {
    const { versionId: v1, recipeId } = await released();
    const v2 = (await engineer.post(`/api/versions/${v1}/copy`).send({})).body.data.id;
    await engineer.post(`/api/versions/${v2}/submit`).send({});
    const queue = (await lead.get('/api/sign-off/queue')).body.data;
    const item = queue.find((q: { versionId: number }) => q.versionId === v2);
    expect(item).toMatchObject({ recipeId, versionNo: 2, releasedVersionId: v1, releasedVersionNo: 1, mine: false });
    expect((await engineer.get('/api/sign-off/queue')).status).toBe(403);
  });

  it('the audit trail filters and exports CSV', async () => {
    const { versionId } = await released();
    const page = (await lead.get(`/api/audit?entityType=recipe_version&entityId=${versionId}`)).body.data;
    expect(page.rows.map((r: { action: string }) => r.action)).toEqual(['version.release', 'version.submit', 'recipe.import']);
    const csv = await admin.get(`/api/audit/export.csv?entityType=recipe_version&entityId=${versionId}`);
    expect(csv.status).toBe(200);
    expect(csv.headers['content-type']).toMatch(/text\/csv/);
    const lines = csv.text.trim().split('\r\n');
    expect(lines[0]).toBe('id,at,actor,role,action,entity,entity_id,from,to,comment,content_hash,details');
    expect(lines).toHaveLength(4);
    expect((await engineer.get('/api/audit')).status).toBe(403);
    expect((await admin.get('/api/audit?from=yesterday')).status).toBe(400);
  });

  it('a mail failure never blocks a transition; the outbox shows it and a retry sends it', async () => {
    await ctx.created.flushMail();
    ctx.smtp.failNext(1);
    const { versionId } = await inReview();
    expect(await stateOf(versionId)).toBe('in_review');
    const failed = await ctx.database.db.select().from(outboxMessages).where(eq(outboxMessages.relatedId, versionId));
    expect(failed[0]).toMatchObject({ status: 'failed', attempts: 1 });
    expect(failed[0].lastError).toMatch(/unavailable/);
    const outbox = (await admin.get('/api/outbox')).body.data.messages;
    expect(outbox.find((m: { id: number }) => m.id === failed[0].id).status).toBe('failed');
    const retried = await admin.post(`/api/outbox/${failed[0].id}/retry`).send({});
    expect(retried.body.data.status).toBe('sent');
    expect((await lead.get('/api/outbox')).status).toBe(403);
  });
});
