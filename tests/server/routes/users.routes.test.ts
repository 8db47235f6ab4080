import { describe, expect, it } from 'vitest';
import { desc, eq } from 'drizzle-orm';
import { auditEvents, users } from '../../../server/db/schema';
import { useTestApp } from '../../support/test-app';

const ctx = useTestApp();

describe('people directory', () => {
  it.each(['engineer', 'lead', 'operator'] as const)('%s reads names and roles, without e-mail addresses', async (role) => {
    const agent = await ctx.signIn(role);
    const res = await agent.get('/api/users/directory');
    expect(res.status).toBe(200);
    expect(res.body.data.length).toBeGreaterThanOrEqual(6);
    expect(Object.keys(res.body.data[0]).sort()).toEqual(['active', 'id', 'name', 'role']);
  });
});

describe('people (admin)', () => {
  it('GET /api/users lists people without password hashes', async () => {
    const admin = await ctx.signIn('admin');
    const res = await admin.get('/api/users');
    expect(res.status).toBe(200);
    expect(res.body.data.length).toBeGreaterThanOrEqual(4);
    expect(Object.keys(res.body.data[0]).sort()).toEqual(['active', 'createdAt', 'email', 'id', 'name', 'role', 'updatedAt']);
  });

  it('POST /api/users creates a person who can then sign in, and writes an audit row', async () => {
    const admin = await ctx.signIn('admin');
    const res = await admin
      .post('/api/users')
      .send({ email: 'New.Person@Pilotline.example', name: 'New Person', role: 'operator', password: 'a-long-password' });
    expect(res.status).toBe(201);
    expect(res.body.data).toMatchObject({ email: 'new.person@pilotline.example', role: 'operator', active: true });
    const [row] = await ctx.database.db.select().from(users).where(eq(users.id, res.body.data.id));
    expect(row.passwordHash).toMatch(/^\$2[aby]\$1\d\$/);
    const [audit] = await ctx.database.db.select().from(auditEvents).orderBy(desc(auditEvents.id)).limit(1);
    expect(audit).toMatchObject({ action: 'person.create', entityType: 'user', entityId: res.body.data.id, actorRole: 'admin' });
    await ctx.signIn('operator', 'new.person@pilotline.example', 'a-long-password');
  });

  it('refuses a duplicate e-mail with 409 and changes nothing', async () => {
    const admin = await ctx.signIn('admin');
    const before = await ctx.database.db.select().from(users);
    const res = await admin
      .post('/api/users')
      .send({ email: 'engineer@pilotline.example', name: 'Twin', role: 'engineer', password: 'a-long-password' });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('conflict');
    expect(await ctx.database.db.select().from(users)).toHaveLength(before.length);
  });

  it.each([
    [{ email: 'x', name: '', role: 'boss', password: 'short' }, ['email', 'name', 'password', 'role']],
    [{}, ['email', 'name', 'password', 'role']],
    [{ email: 'ok@pilotline.example', name: 'Ok', role: 'lead', password: 123 }, ['password']],
  ])('POST /api/users with %j answers 400 naming %j', async (body, paths) => {
    const admin = await ctx.signIn('admin');
    const res = await admin.post('/api/users').send(body);
    expect(res.status).toBe(400);
    expect([...new Set(res.body.error.issues.map((i: { path: string }) => i.path))].sort()).toEqual(paths);
  });

  it('PATCH /api/users/:id changes role and name; the new role applies to live sessions', async () => {
    const admin = await ctx.signIn('admin');
    const made = await admin
      .post('/api/users')
      .send({ email: 'mover@pilotline.example', name: 'Mover', role: 'operator', password: 'a-long-password' });
    const theirs = await ctx.signIn('operator', 'mover@pilotline.example', 'a-long-password');
    expect((await theirs.get('/api/users')).status).toBe(403);
    const res = await admin.patch(`/api/users/${made.body.data.id}`).send({ role: 'admin', name: 'Mover Two' });
    expect(res.status).toBe(200);
    expect(res.body.data).toMatchObject({ role: 'admin', name: 'Mover Two' });
    expect((await theirs.get('/api/users')).status).toBe(200);
  });

  it('PATCH resets a password', async () => {
    const admin = await ctx.signIn('admin');
    const made = await admin
      .post('/api/users')
      .send({ email: 'forgetful@pilotline.example', name: 'Forgetful', role: 'engineer', password: 'first-password' });
    const res = await admin.patch(`/api/users/${made.body.data.id}`).send({ password: 'second-password' });
    expect(res.status).toBe(200);
    await ctx.signIn('engineer', 'forgetful@pilotline.example', 'second-password');
  });

  it.each([
    [{}, 'Change at least one field'],
    [{ role: 'king' }, 'role'],
    [{ active: 'no' }, 'active'],
    [{ email: 'a@b.example' }, ''],
  ])('PATCH /api/users/:id with %j answers 400', async (body, hint) => {
    const admin = await ctx.signIn('admin');
    const res = await admin.patch('/api/users/1').send(body);
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body.error.issues)).toContain(hint);
  });

  it('PATCH of an unknown person is 404, of a bad id 400', async () => {
    const admin = await ctx.signIn('admin');
    expect((await admin.patch('/api/users/999999').send({ name: 'X' })).status).toBe(404);
    const bad = await admin.patch('/api/users/abc').send({ name: 'X' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.issues[0].path).toBe('id');
  });

  it('an admin cannot deactivate or demote themselves', async () => {
    const admin = await ctx.signIn('admin');
    const me = (await admin.get('/api/me')).body.data;
    for (const body of [{ active: false }, { role: 'engineer' }]) {
      const res = await admin.patch(`/api/users/${me.id}`).send(body);
      expect(res.status).toBe(409);
    }
    expect((await admin.get('/api/me')).body.data).toMatchObject({ role: 'admin', active: true });
  });
});
