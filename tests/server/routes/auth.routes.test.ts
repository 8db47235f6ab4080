import { describe, expect, it } from 'vitest';
import request from 'supertest';
import { SESSION_COOKIE } from '../../../server/app';
import { personOf, useTestApp } from '../../support/test-app';

const ctx = useTestApp();

function sessionCookie(res: request.Response): string | undefined {
  const raw = res.headers['set-cookie'] as unknown as string[] | undefined;
  return raw?.find((c) => c.startsWith(`${SESSION_COOKIE}=`));
}

describe('POST /api/auth/sign-in', () => {
  it('signs in with the right password and returns the person without the hash', async () => {
    const p = personOf('engineer');
    const res = await request(ctx.created.app).post('/api/auth/sign-in').send({ email: p.email, password: p.password });
    expect(res.status).toBe(200);
    expect(res.body.data).toMatchObject({ email: p.email, role: 'engineer', active: true });
    expect(JSON.stringify(res.body)).not.toMatch(/hash|\$2[aby]\$/);
    const cookie = sessionCookie(res)!;
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    expect(cookie).not.toMatch(/Secure/);
  });

  it('accepts the e-mail in any case and with spaces around it', async () => {
    const p = personOf('lead');
    const res = await request(ctx.created.app)
      .post('/api/auth/sign-in')
      .send({ email: `  ${p.email.toUpperCase()} `, password: p.password });
    expect(res.status).toBe(200);
  });

  it('refuses a wrong password and an unknown e-mail alike, with 401', async () => {
    const wrong = await request(ctx.created.app)
      .post('/api/auth/sign-in')
      .send({ email: personOf('admin').email, password: 'not-the-password' });
    const unknown = await request(ctx.created.app)
      .post('/api/auth/sign-in')
      .send({ email: 'nobody@pilotline.example', password: 'whatever-it-is' });
    for (const res of [wrong, unknown]) {
      expect(res.status).toBe(401);
      expect(res.body.error.code).toBe('invalid_credentials');
      expect(sessionCookie(res)).toBeUndefined();
    }
  });

  it('answers 400 with field paths for a malformed body', async () => {
    const res = await request(ctx.created.app).post('/api/auth/sign-in').send({ email: 'not-an-email' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid_input');
    expect(res.body.error.issues.map((i: { path: string }) => i.path).sort()).toEqual(['email', 'password']);
  });

  it('answers 400 malformed_json for a body that is not JSON', async () => {
    const res = await request(ctx.created.app)
      .post('/api/auth/sign-in')
      .set('content-type', 'application/json')
      .send('{"email": ');
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('malformed_json');
  });

  it('regenerates the session id at sign-in', async () => {
    const agent = request.agent(ctx.created.app);
    const p = personOf('operator');
    // A session that exists before sign-in (e.g. a planted cookie) …
    const first = await agent.post('/api/auth/sign-in').send({ email: p.email, password: p.password });
    const before = sessionCookie(first)!.split(';')[0];
    const second = await agent.post('/api/auth/sign-in').send({ email: p.email, password: p.password });
    const after = sessionCookie(second)!.split(';')[0];
    expect(after).not.toBe(before);
    // … is not valid any more.
    const old = await request(ctx.created.app).get('/api/me').set('Cookie', before);
    expect(old.status).toBe(401);
  });

  it('rate-limits sign-in attempts with 429', async () => {
    const limited = ctx.newInstance({ signInLimit: { max: 3, windowMs: 60_000 } });
    const statuses: number[] = [];
    for (let i = 0; i < 5; i++) {
      const res = await request(limited.app).post('/api/auth/sign-in').send({ email: 'x@pilotline.example', password: 'wrong-password' });
      statuses.push(res.status);
    }
    expect(statuses).toEqual([401, 401, 401, 429, 429]);
    const res = await request(limited.app).post('/api/auth/sign-in').send({ email: 'x@pilotline.example', password: 'y' });
    expect(res.body.error.code).toBe('rate_limited');
  });

  it('sends helmet security headers', async () => {
    const res = await request(ctx.created.app).get('/api/health');
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['content-security-policy']).toBeDefined();
    expect(res.headers['x-powered-by']).toBeUndefined();
  });
});

describe('sessions', () => {
  it('GET /api/me returns the signed-in person, 401 without a session', async () => {
    const agent = await ctx.signIn('lead');
    const me = await agent.get('/api/me');
    expect(me.status).toBe(200);
    expect(me.body.data.role).toBe('lead');
    const anon = await request(ctx.created.app).get('/api/me');
    expect(anon.status).toBe(401);
    expect(anon.body.error.code).toBe('unauthenticated');
  });

  it('sign-out destroys the session', async () => {
    const p = personOf('engineer');
    const res = await request(ctx.created.app).post('/api/auth/sign-in').send({ email: p.email, password: p.password });
    const cookie = sessionCookie(res)!.split(';')[0];
    expect((await request(ctx.created.app).get('/api/me').set('Cookie', cookie)).status).toBe(200);
    const out = await request(ctx.created.app).post('/api/auth/sign-out').set('Cookie', cookie);
    expect(out.status).toBe(204);
    expect((await request(ctx.created.app).get('/api/me').set('Cookie', cookie)).status).toBe(401);
  });

  it('a session survives a new app instance (sessions live in MariaDB)', async () => {
    const p = personOf('admin');
    const res = await request(ctx.created.app).post('/api/auth/sign-in').send({ email: p.email, password: p.password });
    const cookie = sessionCookie(res)!.split(';')[0];
    const other = ctx.newInstance();
    const me = await request(other.app).get('/api/me').set('Cookie', cookie);
    expect(me.status).toBe(200);
    expect(me.body.data.email).toBe(p.email);
  });

  it('a deactivated person is locked out at once, even with a live session', async () => {
    const admin = await ctx.signIn('admin');
    const created = await admin
      .post('/api/users')
      .send({ email: 'leaving@pilotline.example', name: 'Leaving Soon', role: 'engineer', password: 'leaving-pass-1' });
    expect(created.status).toBe(201);
    const theirs = await ctx.signIn('engineer', 'leaving@pilotline.example', 'leaving-pass-1');
    expect((await theirs.get('/api/me')).status).toBe(200);
    const off = await admin.patch(`/api/users/${created.body.data.id}`).send({ active: false });
    expect(off.status).toBe(200);
    expect((await theirs.get('/api/me')).status).toBe(401);
    const again = await request(ctx.created.app)
      .post('/api/auth/sign-in')
      .send({ email: 'leaving@pilotline.example', password: 'leaving-pass-1' });
    expect(again.status).toBe(401);
  });
});

describe('unknown API routes', () => {
  it('answer a JSON 404', async () => {
    const res = await request(ctx.created.app).get('/api/no-such-thing');
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('not_found');
  });
});
